import { describe, expect, it } from 'vitest';
import { unexpectedBuildLines } from './build-output';

describe('unexpectedBuildLines', () => {
	it('lets the progress lines of a quiet build through', () => {
		const quiet =
			'\nRun npm run preview to preview your production build locally.\n\n> Using @sveltejs/adapter-node\n  \u001b[32m✔ done\u001b[39m\n';
		expect(unexpectedBuildLines(quiet)).toEqual([]);
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
