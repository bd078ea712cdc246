// Backup and restore of a running installation: `npm run db:backup` while the built server takes
// record and photo writes, then `npm run db:restore` into another installation, which must come
// up with every write acknowledged before the backup began, photos served, digests matching.
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import { signInCookie } from '../scripts/bench/http';
import type { Manifest } from '../scripts/lib/backup';
import { openSqlite } from '../scripts/lib/sqlite-file';
import { ownServer, type OwnServer } from './support/own-server';
import { engineer } from './support/people';
import { newAcked, photoWriter, recordWriter, type WriterContext } from './support/writers';

const servers: OwnServer[] = [];
const backups = mkdtempSync(join(tmpdir(), 'beadline-backups-'));

test.afterAll(async () => {
	for (const s of servers) await s.dispose();
	rmSync(backups, { recursive: true, force: true });
});

/** Runs a script as `npm run` would, without blocking this process (the writers keep going). */
function npm(script: string, args: string[], env: NodeJS.ProcessEnv) {
	return new Promise<{ status: number | null; stdout: string; stderr: string }>((resolve) => {
		const child = spawn(process.execPath, ['--import', 'tsx', script, ...args], { env });
		let stdout = '';
		let stderr = '';
		child.stdout.on('data', (d: Buffer) => (stdout += d));
		child.stderr.on('data', (d: Buffer) => (stderr += d));
		child.on('close', (status) => resolve({ status, stdout, stderr }));
	});
}

async function recordDigests(file: string, ids: number[]): Promise<string[]> {
	const db = await openSqlite(file, { readonly: true });
	try {
		const rows = await db.all(
			`SELECT * FROM settings_records WHERE id IN (${ids.join(',')}) ORDER BY id`
		);
		return rows.map((r) => createHash('sha256').update(JSON.stringify(r)).digest('hex'));
	} finally {
		await db.close();
	}
}

test('db:backup under write load, db:restore into a new installation that serves it all', async () => {
	test.setTimeout(180_000);
	const live = await ownServer();
	servers.push(live);
	await live.start();
	const ctx: WriterContext = {
		origin: live.origin,
		engineer: await signInCookie(live.origin, engineer.email, engineer.password),
		inspector: { cookie: '', password: '' },
		stop: { now: false },
		acked: newAcked()
	};
	const writers = [recordWriter(ctx, 'b1'), recordWriter(ctx, 'b2'), photoWriter(ctx, 'bp')];
	while (ctx.acked.photos.length < 3 || ctx.acked.records.length < 5)
		await new Promise((r) => setTimeout(r, 50));

	const before = { records: [...ctx.acked.records], photos: [...ctx.acked.photos] };
	const out = join(backups, 'under-load');
	const t = Date.now();
	const backup = await npm('scripts/db-backup.ts', ['--out', out], live.env);
	const backupMs = Date.now() - t;
	const during = ctx.acked.records.length + ctx.acked.photos.length;
	ctx.stop.now = true;
	await Promise.all(writers);
	expect(backup.status, backup.stderr).toBe(0);
	const manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')) as Manifest;
	expect(manifest.uploads.missing).toEqual([]);

	// A restore over the running server's database is refused.
	const refused = await npm('scripts/db-restore.ts', [out], live.env);
	expect(refused.status).toBe(1);
	expect(refused.stderr).toMatch(/open in another process/);

	const ids = [...before.records, ...before.photos].map((r) => r.id);
	const liveDigests = await recordDigests(live.databaseFile, ids);
	await live.kill('SIGTERM');

	// A second installation, stopped, receives the backup.
	const restoredAt = await ownServer();
	servers.push(restoredAt);
	const restore = await npm('scripts/db-restore.ts', [out], restoredAt.env);
	expect(restore.status, restore.stderr).toBe(0);
	expect(restore.stdout).toMatch(/digests match/);
	expect(await recordDigests(restoredAt.databaseFile, ids)).toEqual(liveDigests);

	await restoredAt.start();
	const cookie = await signInCookie(restoredAt.origin, engineer.email, engineer.password);
	const db = await openSqlite(restoredAt.databaseFile, { readonly: true });
	const photos = await db.all<{ id: number; record_id: number }>(
		`SELECT id, record_id FROM settings_photos WHERE record_id IN (${before.photos.map((p) => p.id).join(',')})`
	);
	await db.close();
	expect(photos.length).toBe(before.photos.length);
	for (const p of photos) {
		const res = await fetch(`${restoredAt.origin}/records/${p.record_id}/photos/${p.id}`, {
			headers: { cookie }
		});
		expect(res.status, `photo ${p.id}`).toBe(200);
		expect(res.headers.get('content-type')).toBe('image/png');
	}
	const rows = Object.values(manifest.database.tables).reduce((n, x) => n + x.rows, 0);
	console.log(
		`[backup] db:backup under load in ${backupMs} ms: ${rows} rows, ${manifest.uploads.files.length} uploads (${(manifest.uploads.bytes / 1024).toFixed(0)} KB); ${during - ids.length} writes acknowledged while it ran\n` +
			`[backup] db:restore into a new installation: ${ids.length} records acknowledged before the backup identical by SHA-256, ${photos.length} photos served; restore over a live server refused`
	);
});
