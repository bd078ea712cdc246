import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { openSqlite } from './lib/sqlite-file';

// db:copy needs a PostgreSQL target: it runs in the PostgreSQL unit run (vitest.postgres.config.ts,
// BEADLINE_TEST_DB=postgres), where DATABASE_URL is a fresh, empty database of the test cluster.
const onPostgres = process.env.BEADLINE_TEST_DB === 'postgres';
const dir = mkdtempSync(join(tmpdir(), 'beadline-copy-'));
const demo = join(dir, 'demo.sqlite');
const back = join(dir, 'back.sqlite');

const run = (script: string, args: string[], env: NodeJS.ProcessEnv) =>
	spawnSync(process.execPath, ['--import', 'tsx', script, ...args], {
		env: { ...process.env, ...env },
		encoding: 'utf8'
	});

describe.skipIf(!onPostgres)('db:copy (needs PostgreSQL: runs in the PostgreSQL unit run)', () => {
	beforeAll(() => {
		const seeded = run('scripts/db-seed.ts', [], {
			BEADLINE_DEMO: '1',
			DATABASE_URL: `sqlite:${demo}`
		});
		expect(seeded.status, seeded.stderr).toBe(0);
	});

	it('copies the SQLite demo to an empty PostgreSQL database and verifies every signature', async () => {
		const { copyDatabase } = await import('./lib/db-copy');
		const uploadsFrom = join(dir, 'up-from');
		const key = `ab${'0'.repeat(30)}.jpg`;
		mkdirSync(join(uploadsFrom, 'ab'), { recursive: true });
		writeFileSync(join(uploadsFrom, 'ab', key), 'photo bytes');
		const report = await copyDatabase({
			from: `sqlite:${demo}`,
			to: process.env.DATABASE_URL!,
			uploadsFrom,
			uploadsTo: join(dir, 'up-to')
		});
		const rows = Object.fromEntries(report.tables.map((t) => [t.table, t.rows]));
		expect(rows.shops).toBe(2); // the demo's two invented shops
		expect(rows.sign_offs).toBeGreaterThan(0);
		expect(report.signaturesChecked).toBeGreaterThan(0);
		expect(report.pqrsChecked).toBeGreaterThan(0);
		expect(report.uploads.files).toBe(1);
		expect(readFileSync(join(dir, 'up-to', 'ab', key), 'utf8')).toBe('photo bytes');
		// The id sequences moved past the copied ids: a new row does not collide.
		const { Shop } = await import('../src/lib/server/models');
		const shop = await Shop.create({ name: 'After the copy' });
		expect(shop.id).toBeGreaterThan(2);
	});

	it('refuses a target that is not empty, and says so', async () => {
		const { copyDatabase, CopyRefused } = await import('./lib/db-copy');
		const attempt = copyDatabase({ from: `sqlite:${demo}`, to: process.env.DATABASE_URL! });
		await expect(attempt).rejects.toBeInstanceOf(CopyRefused);
		await expect(attempt).rejects.toThrow(/is not empty.*nothing was copied/);
	});

	it('copies back to SQLite through the command, the records and signatures unchanged', async () => {
		const r = run(
			'scripts/db-copy.ts',
			['--from', process.env.DATABASE_URL!, '--to', `sqlite:${back}`],
			{}
		);
		expect(r.status, r.stderr).toBe(0);
		expect(r.stdout).toMatch(/Verified: equal row counts in every table/);
		const [a, b] = [
			await openSqlite(demo, { readonly: true }),
			await openSqlite(back, { readonly: true })
		];
		for (const table of ['settings_records', 'sign_offs', 'procedure_revisions', 'audit_events'])
			expect(await b.all(`SELECT * FROM ${table} ORDER BY id`)).toEqual(
				await a.all(`SELECT * FROM ${table} ORDER BY id`)
			);
		await Promise.all([a.close(), b.close()]);
	});
});
