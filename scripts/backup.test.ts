// Backup while records and photos are being written, then restore elsewhere and compare counts,
// table digests and every record's digest; tampered or unfinished backups are refused, and so is
// a restore over a database another connection holds open.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openSqlite } from './lib/sqlite-file';

const dir = mkdtempSync(join(tmpdir(), 'beadline-backup-'));
const live = {
	databaseFile: join(dir, 'live', 'beadline.sqlite'),
	uploadsDir: join(dir, 'live', 'up')
};
process.env.DATABASE_FILE = live.databaseFile;
process.env.UPLOADS_DIR = live.uploadsDir;

const { createBackup, readManifest, restoreBackup, verifyBackup } = await import('./lib/backup');
const { migrate, sequelize } = await import('../src/lib/server/db');
const { seedDemo } = await import('../src/lib/server/seed/seed-demo');
const { createRecord } = await import('../src/lib/server/records');
const { settingsRecordSchema } = await import('../src/lib/schemas/settings-record');
const { addMember } = await import('../src/lib/server/people/test-support');
const { startS3Fake } = await import('./lib/s3-fake');
const { S3Storage } = await import('../src/lib/server/storage/s3');
const { s3Settings } = await import('../src/lib/server/storage/s3-settings');
const { LocalStorage } = await import('../src/lib/server/storage/local');
const { copyUploads, digest } = await import('../src/lib/server/storage/copy');

type Actor = Awaited<ReturnType<typeof addMember>>;
let engineer: Actor;
let png: Uint8Array;

const form = (i: number) =>
	settingsRecordSchema.parse({
		process: 'GTAW',
		currentType: 'DCEN',
		amps: String(100 + (i % 50)),
		thickness: '1/8',
		baseMetalSpec: 'A36',
		outcome: 'sound',
		notes: `backup load ${i}`,
		weldedOn: '2025-03-04'
	});

/** Each record's own digest, so a restore is compared row by row, not only by totals. */
async function recordDigests(file: string, maxId: number): Promise<Map<number, string>> {
	const db = await openSqlite(file, { mustExist: true });
	try {
		const rows = await db.all<Record<string, unknown>>(
			'SELECT * FROM settings_records WHERE id <= ? ORDER BY id',
			[maxId]
		);
		return new Map(
			rows.map((r) => [
				r.id as number,
				createHash('sha256').update(JSON.stringify(r)).digest('hex')
			])
		);
	} finally {
		await db.close();
	}
}

beforeAll(async () => {
	await migrate();
	const { shop } = await seedDemo();
	engineer = await addMember(shop.id, 'engineer', 'Backup Engineer');
	png = await sharp({ create: { width: 40, height: 30, channels: 3, background: '#c63' } })
		.png()
		.toBuffer();
	for (let i = 0; i < 5; i++)
		await createRecord(engineer, form(i), [{ name: `p${i}.png`, bytes: png }]);
});

afterAll(async () => {
	await sequelize.close();
	rmSync(dir, { recursive: true, force: true });
});

describe('db:backup and db:restore', () => {
	it('backs up under write load and restores every acknowledged row and upload', async () => {
		const before = await recordDigests(live.databaseFile, Number.MAX_SAFE_INTEGER);
		const maxBefore = Math.max(...before.keys());
		// Writes with photos keep landing while the snapshot is taken.
		let stop = false;
		let written = 0;
		const load = (async () => {
			for (let i = 100; !stop && i < 400; i++) {
				await createRecord(engineer, form(i), i % 3 ? [] : [{ name: 'l.png', bytes: png }]);
				written++;
			}
		})();
		await new Promise((r) => setTimeout(r, 150));
		const out = join(dir, 'backup-1');
		const m = await createBackup({ ...live, outDir: out });
		stop = true;
		await load;
		expect(written).toBeGreaterThan(0);

		expect(await verifyBackup(out)).toEqual([]);
		expect(m.uploads.missing).toEqual([]);
		expect(m.uploads.referenced).toBeGreaterThanOrEqual(10); // 5 photos + 5 thumbnails
		const saved = m.database.tables.settings_records!.rows;
		expect(saved).toBeGreaterThanOrEqual(before.size);

		const target = {
			databaseFile: join(dir, 'restored', 'b.sqlite'),
			uploadsDir: join(dir, 'restored', 'up')
		};
		const r = await restoreBackup({ dir: out, ...target });
		expect(r.manifest.database.sha256).toBe(m.database.sha256);
		// Every record acknowledged before the backup began is back, byte for byte.
		const restored = await recordDigests(target.databaseFile, maxBefore);
		expect(restored).toEqual(before);
		for (const f of m.uploads.files)
			expect(existsSync(join(target.uploadsDir, f.path)), f.path).toBe(true);
	});

	it('refuses a tampered backup, an unfinished one and a database in use', async () => {
		const out = join(dir, 'backup-2');
		const m = await createBackup({ ...live, outDir: out });
		const target = { databaseFile: join(dir, 'r2', 'b.sqlite'), uploadsDir: join(dir, 'r2', 'up') };

		const upload = join(out, 'uploads', m.uploads.files[0]!.path);
		const original = readFileSync(upload);
		writeFileSync(upload, Buffer.concat([original, Buffer.from('x')]));
		expect((await verifyBackup(out)).join()).toMatch(/changed/);
		await expect(restoreBackup({ dir: out, ...target })).rejects.toThrow(/fails its checks/);
		writeFileSync(upload, original);

		rmSync(join(out, 'manifest.json'));
		await expect(readManifest(out)).rejects.toThrow(/not a finished backup/);

		// The app's own Sequelize connection holds the live file open: like a running server.
		await sequelize.query('SELECT 1');
		const again = join(dir, 'backup-3');
		await createBackup({ ...live, outDir: again });
		await expect(restoreBackup({ dir: again, ...live })).rejects.toThrow(/open in another process/);
	});

	it('runs as npm run db:backup / db:restore and keeps what it replaces', async () => {
		const env = { ...process.env, DATABASE_FILE: live.databaseFile, UPLOADS_DIR: live.uploadsDir };
		const out = join(dir, 'cli-backup');
		const run = (script: string, args: string[], over: NodeJS.ProcessEnv = {}) =>
			spawnSync(process.execPath, ['--import', 'tsx', script, ...args], {
				env: { ...env, ...over },
				encoding: 'utf8'
			});
		const b = run('scripts/db-backup.ts', ['--out', out]);
		expect(b.status, b.stderr).toBe(0);
		expect(b.stdout).toMatch(/Backup written/);

		const target = join(dir, 'cli-restored', 'b.sqlite');
		const over = { DATABASE_FILE: target, UPLOADS_DIR: join(dir, 'cli-restored', 'up') };
		const first = run('scripts/db-restore.ts', [out], over);
		expect(first.status, first.stderr).toBe(0);
		expect(first.stdout).toMatch(/digests match/);
		const second = run('scripts/db-restore.ts', [out], over);
		expect(second.status, second.stderr).toBe(0);
		expect(second.stdout).toMatch(/kept the previous .*before-restore/);
	}, 60_000);

	it('with STORAGE=s3 copies every object of the bucket into the folder and restores them into one', async () => {
		const fake = await startS3Fake({ buckets: ['beadline-restored'] });
		const bucket = (name: string) =>
			new S3Storage(
				s3Settings({
					bucket: name,
					region: '',
					endpoint: fake.endpoint,
					accessKeyId: 'S3RVER',
					secretAccessKey: 'S3RVER',
					forcePathStyle: ''
				})
			);
		const [live3, restored3] = [bucket(fake.bucket), bucket('beadline-restored')];
		try {
			expect((await copyUploads(new LocalStorage(live.uploadsDir), live3)).problems).toEqual([]);
			const out = join(dir, 'backup-s3');
			const m = await createBackup({ ...live, uploads: live3, outDir: out });
			expect(await verifyBackup(out)).toEqual([]);
			expect(m.uploads.missing).toEqual([]);
			const inBucket: string[] = [];
			for await (const o of live3.list()) inBucket.push(o.name);
			expect(m.uploads.files.map((f) => f.path)).toEqual(inBucket.sort());

			const target = {
				databaseFile: join(dir, 'r-s3', 'b.sqlite'),
				uploadsDir: join(dir, 'r-s3', 'up')
			};
			await restoreBackup({ dir: out, ...target, bucket: restored3 });
			for (const f of m.uploads.files) {
				const got = await restored3.get(f.path);
				expect(got && (await digest(got.body)).sha256, f.path).toBe(f.sha256);
			}
			// The bucket took the uploads; no local folder was made for them.
			expect(existsSync(target.uploadsDir)).toBe(false);
		} finally {
			await live3.close();
			await restored3.close();
			await fake.close();
		}
	});
});
