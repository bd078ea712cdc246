import { describe, expect, it } from 'vitest';
import { unexpectedBuildLines } from './build-output';

describe('unexpectedBuildLines', () => {
	it('lets the progress lines of a quiet build through', () => {
		const quiet =
			'\nRun npm run preview to preview your production build locally.\n\n> Using @sveltejs/adapter-node\n  \u001b[32m✔ done\u001b[39m\n';
		expect(unexpectedBuildLines(quiet)).toEqual([]);
	});

	it("lets the service worker's own progress lines through, as CI prints them", () => {
		// Printed by the CI run on record when the output is not a terminal.
		const worker = [
			'vite v8.4.0 building client environment for production...',
			'transforming...',
			'✓ 8 modules transformed.',
			'rendering chunks...',
			'computing gzip size...',
			'.svelte-kit/output/client/service-worker.js  14.81 kB │ gzip: 5.07 kB',
			'',
			'✓ built in 20ms'
		].join('\n');
		expect(unexpectedBuildLines(worker)).toEqual([]);
	});

	it('reports every other line, warnings of any kind included', () => {
		const noisy = [
			'> Using @sveltejs/adapter-node',
			'Circular dependency: a.mjs -> b.mjs -> a.mjs',
			'[plugin rolldown:vite-resolve] Module "node:dns/promises" has been externalized for browser compatibility',
			'✔ done'
		].join('\n');
		expect(unexpectedBuildLines(noisy)).toEqual([
			'Circular dependency: a.mjs -> b.mjs -> a.mjs',
			'[plugin rolldown:vite-resolve] Module "node:dns/promises" has been externalized for browser compatibility'
		]);
	});
});
