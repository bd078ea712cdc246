// The import graph of the weld core (src/lib/weld), type imports included, type imports included: eslint's import-x/no-cycle guards value
// imports only (it skips `import type`), so this test guards the rest. It sits beside the folder,
// not in it, because it checks code structure and no welding values.
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const DIR = join(dirname(fileURLToPath(import.meta.url)), 'weld');
const modules = readdirSync(DIR)
	.filter((f) => f.endsWith('.ts') && !f.endsWith('.test.ts') && !f.endsWith('.d.ts'))
	.map((f) => f.replace(/\.ts$/, ''));

/** Sibling modules a file names in `import … from './x'` or `export … from './x'`. */
function siblings(name: string): string[] {
	const text = readFileSync(join(DIR, `${name}.ts`), 'utf8');
	const found = [...text.matchAll(/^(?:import|export)\b[^;]*?from\s+'\.\/([\w-]+)'/gms)];
	return [...new Set(found.map((m) => m[1] ?? ''))];
}

const graph = new Map(modules.map((m) => [m, siblings(m)]));

/** One cycle as a path "a -> b -> a", or null. */
function findCycle(): string | null {
	const state = new Map<string, 'open' | 'done'>();
	const path: string[] = [];
	const visit = (m: string): string | null => {
		if (state.get(m) === 'done') return null;
		if (state.get(m) === 'open') return [...path.slice(path.indexOf(m)), m].join(' -> ');
		state.set(m, 'open');
		path.push(m);
		for (const next of graph.get(m) ?? []) {
			const cycle = visit(next);
			if (cycle) return cycle;
		}
		path.pop();
		state.set(m, 'done');
		return null;
	};
	for (const m of modules) {
		const cycle = visit(m);
		if (cycle) return cycle;
	}
	return null;
}

describe('weld core layers', () => {
	it('reads the graph (the regex still matches the import style)', () => {
		expect(graph.get('run-checks')).toContain('findings');
		expect(graph.get('findings')).toContain('types');
	});

	it('types.ts, the bottom layer, imports nothing from its siblings', () => {
		expect(graph.get('types')).toEqual([]);
	});

	it('has no import cycle, type imports included', () => {
		expect(findCycle()).toBeNull();
	});
});
