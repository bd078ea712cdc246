import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
	plugins: [tailwindcss(), sveltekit()],
	build: {
		// Rolldown's "plugins took long" notice measures the machine, not the code: on shared
		// cores it comes and goes. Every other build warning fails `npm test` (scripts/test.ts).
		rolldownOptions: {
			checks: { bundlerTimings: false },
			// The weld core and the reference tables are pure (DEVELOPERS.md): importing one name
			// from the `$lib/weld` barrel must not bring every module behind it. Their top-level
			// tables are built with calls (maps, lookups) that the bundler cannot prove pure, so
			// without this each page that shows one weld value carried the whole core.
			treeshake: {
				moduleSideEffects: [
					{ test: /[\\/](src[\\/]lib[\\/]weld|reference)[\\/]/, sideEffects: false }
				]
			}
		}
	},
	test: {
		include: ['src/**/*.test.ts', 'scripts/**/*.test.ts'],
		environment: 'node',
		// Property tests take one seed a file, printed on failure and replayed with FC_SEED.
		setupFiles: ['src/lib/test-support/fast-check.ts'],
		// SQLite files per test file; keep workers few so native builds stay light on 2 cores.
		maxWorkers: 2,
		testTimeout: 30_000,
		// Files that migrate and seed a fresh database in beforeAll need more than the 10 s default.
		hookTimeout: 60_000
	}
});
