// The data layer's unit tests a second time, on PostgreSQL: `npx vitest run --config
// vitest.postgres.config.ts` (npm test runs it as its own step). One throw-away cluster for the
// run, a fresh database per test file (scripts/lib/vitest-postgres-*.ts). Which files: every
// test file that opens a database (it names DATABASE_FILE or BEADLINE_TEST_DB); pure tests
// gain nothing from a second run. SQLite-only tests skip themselves on BEADLINE_TEST_DB=postgres.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { defineConfig, mergeConfig } from 'vitest/config';
import base from './vite.config';

/** SQLite's own tools (online backup of the file), not the data layer. */
const SQLITE_ONLY = ['scripts/backup.test.ts'];

function databaseTests(dir: string): string[] {
	const out: string[] = [];
	for (const e of readdirSync(dir, { withFileTypes: true })) {
		const path = join(dir, e.name);
		if (e.isDirectory()) out.push(...databaseTests(path));
		else if (
			e.name.endsWith('.test.ts') &&
			!SQLITE_ONLY.includes(path) &&
			/DATABASE_FILE|BEADLINE_TEST_DB/.test(readFileSync(path, 'utf8'))
		)
			out.push(path);
	}
	return out;
}

const config = mergeConfig(
	base,
	defineConfig({
		test: {
			globalSetup: ['scripts/lib/vitest-postgres-global.ts'],
			setupFiles: ['scripts/lib/vitest-postgres-file.ts'],
			env: { BEADLINE_TEST_DB: 'postgres' }
		}
	})
);
// mergeConfig would add to the base's include list; this run has its own.
config.test!.include = [...databaseTests('src'), ...databaseTests('scripts')];
export default config;
