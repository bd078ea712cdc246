import { spawn } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { freePort } from '../../../../scripts/lib/postgres';
import { parseDatabaseUrl } from './database-url';

// Bad configuration stops start-up with one sentence naming DATABASE_URL, never a stack trace.
const onPostgres = process.env.BEADLINE_TEST_DB === 'postgres';

/** Runs `npm run db:migrate` (the scripts' and the server's shared first step) with `url`. */
function migrateWith(url: string): Promise<{ code: number | null; stderr: string }> {
	return new Promise((resolve) => {
		const child = spawn(process.execPath, ['--import', 'tsx', 'scripts/db-migrate.ts'], {
			env: { ...process.env, DATABASE_URL: url },
			stdio: ['ignore', 'ignore', 'pipe']
		});
		let stderr = '';
		child.stderr.on('data', (d) => (stderr += d));
		child.on('close', (code) => resolve({ code, stderr }));
	});
}

function expectOneSentence(r: { code: number | null; stderr: string }, words: RegExp) {
	expect(r.code).toBe(1);
	const lines = r.stderr.trim().split('\n');
	expect(lines).toHaveLength(1);
	expect(lines[0]).toMatch(/^DATABASE_URL/);
	expect(lines[0]).toMatch(words);
	expect(r.stderr).not.toMatch(/\n\s+at /);
}

describe('DATABASE_URL', () => {
	it('keeps SQLite when unset, and reads sqlite: paths and postgres URLs', () => {
		expect(parseDatabaseUrl(undefined, '/srv/b.sqlite')).toEqual({
			kind: 'sqlite',
			file: '/srv/b.sqlite'
		});
		expect(parseDatabaseUrl('', undefined)).toMatchObject({ kind: 'sqlite' });
		expect(parseDatabaseUrl('sqlite:/srv/x.sqlite', '/ignored')).toEqual({
			kind: 'sqlite',
			file: '/srv/x.sqlite'
		});
		expect(parseDatabaseUrl('sqlite:///srv/x.sqlite', undefined)).toEqual({
			kind: 'sqlite',
			file: '/srv/x.sqlite'
		});
		expect(parseDatabaseUrl('postgres://u:secret@db:5432/beadline', undefined)).toEqual({
			kind: 'postgres',
			url: 'postgres://u:secret@db:5432/beadline',
			display: 'postgres://u:***@db:5432/beadline'
		});
	});

	it('says in one sentence what is wrong with a malformed value, without the password', () => {
		const problem = (v: string) => {
			const r = parseDatabaseUrl(v, undefined);
			return r.kind === 'invalid' ? r.problem : null;
		};
		expect(problem('db.internal/beadline')).toMatch(/^DATABASE_URL is not a URL/);
		expect(problem('mysql://u@h/db')).toMatch(/^DATABASE_URL starts with "mysql:"/);
		expect(problem('postgres://u:hunter2@h')).toMatch(/needs a host and a database name/);
		expect(problem('postgres://u:hunter2@h')).not.toContain('hunter2');
		expect(problem('sqlite:')).toMatch(/names no file/);
	});

	it('stops a script on a malformed value with that sentence', async () => {
		expectOneSentence(await migrateWith('not a url'), /is not a URL/);
	});

	it('stops a script when no server answers at the address', async () => {
		const port = await freePort();
		expectOneSentence(
			await migrateWith(`postgres://beadline:pw@127.0.0.1:${port}/beadline`),
			new RegExp(`127\\.0\\.0\\.1:${port} that does not answer`)
		);
	});

	it.runIf(onPostgres)('stops a script on a refused user or a missing database', async () => {
		const url = new URL(process.env.DATABASE_URL!);
		const stranger = new URL(url.href);
		stranger.username = 'nobody_here';
		expectOneSentence(await migrateWith(stranger.href), /user name or password was refused/);
		const missing = new URL(url.href);
		missing.pathname = '/no_such_database';
		expectOneSentence(await migrateWith(missing.href), /database that does not exist/);
	});
});
