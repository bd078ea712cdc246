// The data layer's unit tests a second time, on PostgreSQL: `npx vitest run --config
// vitest.postgres.config.ts` (npm test runs it as its own step). One throw-away cluster for the
// run, a fresh database per test file (scripts/lib/vitest-postgres-*.ts).
import { defineConfig, mergeConfig } from 'vitest/config';
import base from './vite.config';

export default mergeConfig(
	base,
	defineConfig({
		test: {
			include: [
				'src/lib/server/**/*.test.ts',
				'src/routes/api/**/*.test.ts',
				'scripts/db-copy.test.ts'
			],
			globalSetup: ['scripts/lib/vitest-postgres-global.ts'],
			setupFiles: ['scripts/lib/vitest-postgres-file.ts'],
			env: { BEADLINE_TEST_DB: 'postgres' }
		}
	})
);
