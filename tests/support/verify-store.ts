// What "nothing acknowledged is lost" means, checked on the database file and the uploads folder
// of a server: SQLite's own checks, every acknowledged write present, every stored upload
// complete and named by a row, and no upload left half-written.
import { join } from 'node:path';
import { stat } from 'node:fs/promises';
import sharp from 'sharp';
import { keyOfPath, listFiles, referencedUploads } from '../../scripts/lib/backup';
import { openSqlite } from '../../scripts/lib/sqlite-file';
import type { Acked } from './writers';

export const ORPHANED_DIR = 'orphaned';

export interface StoreReport {
	problems: string[];
	files: number;
	quarantined: number;
}

const placeholders = (n: number) => Array.from({ length: n }, () => '?').join(',');

export async function verifyStore(
	databaseFile: string,
	uploadsDir: string,
	acked: Acked,
	opts: { decodeFrom?: number } = {}
): Promise<StoreReport> {
	const problems: string[] = [];
	const db = await openSqlite(databaseFile, { readonly: true });
	try {
		const ic = await db.all<{ integrity_check: string }>('PRAGMA integrity_check');
		if (ic.map((r) => r.integrity_check).join() !== 'ok')
			problems.push(`integrity_check: ${JSON.stringify(ic)}`);
		const fk = await db.all('PRAGMA foreign_key_check');
		if (fk.length) problems.push(`foreign_key_check: ${JSON.stringify(fk.slice(0, 5))}`);

		const all = [...acked.records, ...acked.photos];
		const rows = all.length
			? await db.all<{ id: number; notes: string }>(
					`SELECT id, notes FROM settings_records WHERE id IN (${placeholders(all.length)})`,
					all.map((r) => r.id)
				)
			: [];
		const notes = new Map(rows.map((r) => [r.id, r.notes]));
		for (const r of all)
			if (notes.get(r.id) !== r.marker) problems.push(`acknowledged record #${r.id} is missing`);

		const signed = acked.signOffs.length
			? await db.all<{ id: number; digest: string }>(
					`SELECT id, digest FROM sign_offs WHERE id IN (${placeholders(acked.signOffs.length)})`,
					acked.signOffs.map((s) => s.signOffId)
				)
			: [];
		const digests = new Map(signed.map((s) => [s.id, s.digest]));
		for (const s of acked.signOffs)
			if (digests.get(s.signOffId) !== s.digest)
				problems.push(`acknowledged sign-off #${s.signOffId} is missing or changed`);

		// Each acknowledged photo record has its photo, complete on disk (decoded in full).
		const photoIds = acked.photos.map((p) => p.id);
		const photos = photoIds.length
			? await db.all<{ record_id: number; storage_key: string; thumb_key: string; bytes: number }>(
					`SELECT record_id, storage_key, thumb_key, bytes FROM settings_photos
					 WHERE record_id IN (${placeholders(photoIds.length)})`,
					photoIds
				)
			: [];
		const withPhoto = new Set(photos.map((p) => p.record_id));
		for (const id of photoIds)
			if (!withPhoto.has(id)) problems.push(`acknowledged record #${id} lost its photo`);
		for (const p of photos.filter((x) => x.record_id >= (opts.decodeFrom ?? 0))) {
			for (const key of [p.storage_key, p.thumb_key]) {
				const path = join(uploadsDir, key.slice(0, 2), key);
				try {
					await sharp(path, { failOn: 'error' }).stats();
				} catch (e) {
					problems.push(`upload ${key} of record #${p.record_id} is unreadable: ${String(e)}`);
				}
			}
			const size = (await stat(join(uploadsDir, p.storage_key.slice(0, 2), p.storage_key))).size;
			if (size !== p.bytes)
				problems.push(`upload ${p.storage_key}: ${size} bytes, row says ${p.bytes}`);
		}

		// The storage tree itself: nothing half-written, nothing no row names.
		const referenced = await referencedUploads(db);
		const files = await listFiles(uploadsDir);
		const live = files.filter((f) => !f.startsWith(`${ORPHANED_DIR}/`));
		const parts = (await listFiles(uploadsDir, { withParts: true })).filter(
			(f) => f.endsWith('.part') && !f.startsWith(`${ORPHANED_DIR}/`)
		);
		for (const f of parts) problems.push(`half-written upload ${f}`);
		for (const f of live) if (!referenced.has(keyOfPath(f))) problems.push(`orphaned upload ${f}`);
		return { problems, files: live.length, quarantined: files.length - live.length };
	} finally {
		await db.close();
	}
}
