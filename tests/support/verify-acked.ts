// "Nothing acknowledged is lost", checked through any database and any upload store: the
// database's own checks, every acknowledged record and sign-off in place, every acknowledged
// photo fetched through a running process and decoded in full.
import sharp from 'sharp';
import type { AnyDatabase } from './any-database';
import type { Acked } from './writers';

const list = (n: number) => Array.from({ length: n }, () => '?').join(',') || 'NULL';

export async function verifyAcked(
	db: AnyDatabase,
	a: Acked,
	/** A running process to fetch the photos through. */
	origin: string,
	cookie: string
): Promise<string[]> {
	const problems = await db.integrityProblems();
	const all = [...a.records, ...a.photos];
	const notes = new Map(
		(
			await db.all<{ id: number; notes: string }>(
				`SELECT id, notes FROM settings_records WHERE id IN (${list(all.length)})`,
				all.map((r) => r.id)
			)
		).map((r) => [Number(r.id), r.notes])
	);
	for (const r of all)
		if (notes.get(r.id) !== r.marker) problems.push(`acknowledged record #${r.id} missing`);
	const digests = new Map(
		(
			await db.all<{ id: number; digest: string }>(
				`SELECT id, digest FROM sign_offs WHERE id IN (${list(a.signOffs.length)})`,
				a.signOffs.map((s) => s.signOffId)
			)
		).map((s) => [Number(s.id), s.digest])
	);
	for (const s of a.signOffs)
		if (digests.get(s.signOffId) !== s.digest)
			problems.push(`acknowledged sign-off #${s.signOffId} missing or changed`);
	const photos = await db.all<{ id: number; record_id: number; bytes: number }>(
		`SELECT id, record_id, bytes FROM settings_photos WHERE record_id IN (${list(a.photos.length)})`,
		a.photos.map((p) => p.id)
	);
	const withPhoto = new Set(photos.map((p) => Number(p.record_id)));
	for (const p of a.photos)
		if (!withPhoto.has(p.id)) problems.push(`acknowledged record #${p.id} lost its photo`);
	for (const p of photos) {
		const res = await fetch(`${origin}/records/${p.record_id}/photos/${p.id}`, {
			headers: { cookie }
		});
		const bytes = Buffer.from(await res.arrayBuffer());
		if (res.status !== 200 || bytes.length !== Number(p.bytes))
			problems.push(
				`photo ${p.id}: HTTP ${res.status}, ${bytes.length} bytes, row says ${p.bytes}`
			);
		else
			await sharp(bytes, { failOn: 'error' })
				.stats()
				.catch((e: unknown) => problems.push(`photo ${p.id} does not decode: ${String(e)}`));
	}
	return problems;
}
