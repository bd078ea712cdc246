import { describe, expect, it } from 'vitest';
import { CHECK_IDS } from '$lib/weld';
import { PROCEDURE_CHECK_CATALOGUE, PROCEDURE_ONLY_CHECK_IDS } from './check-catalogue';

describe('the procedure checks catalogue', () => {
	it('describes every procedure-only check once, and none of the weld core’s', () => {
		expect(PROCEDURE_CHECK_CATALOGUE.map((c) => c.id)).toEqual([...PROCEDURE_ONLY_CHECK_IDS]);
		for (const id of PROCEDURE_ONLY_CHECK_IDS) expect(CHECK_IDS).not.toContain(id);
	});

	it('gives each a title, what it compares and a source of a known kind', () => {
		for (const c of PROCEDURE_CHECK_CATALOGUE) {
			expect(c.title.length).toBeGreaterThan(3);
			expect(c.compares.length).toBeGreaterThan(10);
			expect(c.sources.length).toBeGreaterThan(0);
			for (const s of c.sources)
				expect(['published', 'common practice', 'from memory']).toContain(s.kind);
		}
	});
});
