// ISO designations beside AWS classifications (issue 15): each check value with the source of
// its row in reference/iso-filler-designations.ts.
import { describe, expect, it } from 'vitest';
import { isoFillerDesignations } from './iso-filler';
import { isoProcedureRanges } from './iso-15614-procedure';

describe('ISO designations beside AWS classifications', () => {
	it('ER316LSi: ISO 14343-A 19 12 3 L Si with ISO 14343-B SS316LSi, one wire', () => {
		const [d] = isoFillerDesignations('ER316LSi');
		// Guide to EN ISO 14343 – A, B, classification examples; AWS A5.9:2017 (ISO 14343:2009 MOD)
		expect(d).toMatchObject({ standard: 'ISO 14343', source: { kind: 'published' } });
		expect(d!.designation).toContain('19 12 3 L Si');
		expect(d!.designation).toContain('SS316LSi');
	});
	it('ER308Mo: ISO 14343-A 20 10 3 with ISO 14343-B SS308Mo', () => {
		const [d] = isoFillerDesignations('er308mo ');
		// Guide to EN ISO 14343 – A, B, classification examples
		expect(d!.designation).toContain('20 10 3');
		expect(d!.source.kind).toBe('published');
	});
	it('ER70S-6: GMAW wire to ISO 14341, GTAW rod to ISO 636, both marked as recalled', () => {
		const gmaw = isoFillerDesignations('ER70S-6', 'GMAW');
		const gtaw = isoFillerDesignations('ER70S-6', '141');
		expect(gmaw.map((d) => d.standard)).toEqual(['ISO 14341']); // from memory
		expect(gmaw[0]!.designation).toContain('G3Si1'); // from memory (chemistry: Guide to EN ISO 14341-A Table 3)
		expect(gtaw.map((d) => d.standard)).toEqual(['ISO 636']); // from memory
		expect([...gmaw, ...gtaw].every((d) => d.source.kind === 'from memory')).toBe(true);
		expect(isoFillerDesignations('ER70S-6')).toHaveLength(2);
	});
	it('aluminium ER4043 and ER5356 to ISO 18273, as a filler maker\u2019s sheets give them', () => {
		// Aufhauser "Aluminum 4043" product sheet: ISO designation AlSi5, AWS A5.10 ER4043
		// (scribd.com/document/747107065/al-4043); Aufhauser "Aluminum 5356" product sheet: ISO
		// designation AlMg5Cr(A), ANSI/AWS A5.10 ER & R 5356 (brazing.com/Products/Welding_alloys/alloy5356.aspx)
		const [d] = isoFillerDesignations('ER4043', 'GTAW');
		expect(d).toMatchObject({ standard: 'ISO 18273', designation: 'ISO 18273 AlSi5' });
		expect(d!.source.kind).toBe('common practice');
		expect(isoFillerDesignations('ER5356')[0]!.designation).toContain('AlMg5Cr(A)');
	});
	it('an unknown or hostile classification answers no rows, never a guess', () => {
		for (const x of ['E7018', '', null, 42, {}, 'ER70S-6'.repeat(20)])
			expect(isoFillerDesignations(x)).toEqual([]);
	});
	it('the ISO 15614-1 filler range shows the ISO designation beside the AWS one', () => {
		const r = isoProcedureRanges({ process: '135', filler: { designation: 'ER70S-6' } });
		const filler = r.items.find((i) => i.clause === '8.4.4');
		expect(filler!.notes.join(' ')).toContain('ISO 14341-A G3Si1'); // from memory
		expect(filler!.notes.join(' ')).toContain('from memory');
	});
});
