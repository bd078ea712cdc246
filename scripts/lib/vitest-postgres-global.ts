// vitest globalSetup of the PostgreSQL run (vitest.postgres.config.ts): one throw-away cluster
// for the whole run and one migrated template database; each test file then gets its own copy
// (vitest-postgres-file.ts), which PostgreSQL makes in a fraction of a second.
import { spawnSync } from 'node:child_process';
import type { TestProject } from 'vitest/node';
import { startPostgres } from './postgres';

export const TEMPLATE = 'beadline_template';

declare module 'vitest' {
	export interface ProvidedContext {
		postgresAdminUrl: string;
		postgresTemplate: string;
	}
}

export default async function setup(project: TestProject) {
	const pg = await startPostgres();
	const url = await pg.createDatabase(TEMPLATE);
	// Migrated in a child process: this one must not hold a connection to the template.
	const r = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/db-migrate.ts'], {
		env: { ...process.env, DATABASE_URL: url },
		encoding: 'utf8'
	});
	if (r.status !== 0) {
		await pg.stop();
		throw new Error(`Migrating the PostgreSQL template failed: ${r.stderr || r.stdout}`);
	}
	console.log(`[postgres] test cluster on port ${pg.port}, template migrated`);
	project.provide('postgresAdminUrl', pg.url);
	project.provide('postgresTemplate', TEMPLATE);
	return () => pg.stop();
}
