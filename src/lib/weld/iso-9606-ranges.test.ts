import { describe, expect, it } from 'vitest';
import {
	isoWelderRanges,
	welderDiameterIso,
	welderFillerGroupsIso,
	welderPositionsIso,
	welderThicknessIso
} from './iso-9606-ranges';

// Worked cases from ISO 9606-1:2012 clause 5 (BS EN ISO 9606-1:2017, identical text, read from a
// text copy of the standard: reference/sources.ts ISO_9606_1_2012).
describe('material thickness (5.7, Tables 6 and 8)', () => {
	it.each([
		[1, 'butt', 1, 3], // s < 3: s to 3 or 2s, whichever is greater, ISO 9606-1:2012 Table 6
		[2, 'butt', 2, 4], // s < 3: 2s = 4 > 3, ISO 9606-1:2012 Table 6
		[3, 'butt', 3, 6], // 3 <= s < 12: 3 to 2s, ISO 9606-1:2012 Table 6
		[10, 'butt', 3, 20], // ISO 9606-1:2012 Table 6
		[12, 'butt', 3, null], // s >= 12: 3 and over, ISO 9606-1:2012 Table 6
		[15, 'butt', 3, null], // ISO 9606-1:2012 Table 6
		[1, 'fillet', 1, 3], // t < 3: t to 2t or 3, whichever is greater, ISO 9606-1:2012 Table 8
		[2, 'fillet', 2, 4], // 2t = 4 > 3, ISO 9606-1:2012 Table 8
		[10, 'fillet', 3, null], // t >= 3: 3 and over, ISO 9606-1:2012 Table 8
		[3, 'fillet', 3, null] // ISO 9606-1:2012 Table 8
	])('t = %s mm %s: %s to %s', (t, weld, min, max) => {
		expect(welderThicknessIso(t, weld)).toMatchObject({ ok: true, min, max });
	});
});

describe('outside pipe diameter (5.7, Table 7)', () => {
	it.each([
		[20, 20, 40], // D <= 25: D to 2D, ISO 9606-1:2012 Table 7
		[25, 25, 50], // ISO 9606-1:2012 Table 7
		[60, 30, null], // D > 25: 0.5D and over, ISO 9606-1:2012 Table 7
		[40, 25, null], // 25 mm min., ISO 9606-1:2012 Table 7
		[114.3, 57.15, null] // ISO 9606-1:2012 Table 7
	])('D = %s: %s to %s', (d, min, max) => {
		expect(welderDiameterIso(d)).toMatchObject({ ok: true, min, max });
	});
});

describe('positions (5.8, Tables 9 and 10)', () => {
	it.each([
		[['PA'], 'butt', ['PA']], // ISO 9606-1:2012 Table 9
		[['PF'], 'butt', ['PA', 'PF']], // ISO 9606-1:2012 Table 9
		[['PH'], 'butt', ['PA', 'PE', 'PF', 'PH']], // ISO 9606-1:2012 Table 9
		[['PJ'], 'butt', ['PA', 'PE', 'PG', 'PJ']], // ISO 9606-1:2012 Table 9
		[['H-L045'], 'butt', ['PA', 'PC', 'PE', 'PF', 'PH', 'H-L045']], // Table 9: PA, PC, PE, PF; PH // from memory
		[['PG'], 'butt', ['PG']], // vertical down qualifies itself, ISO 9606-1:2012 Table 9
		[['PB'], 'fillet', ['PA', 'PB']], // ISO 9606-1:2012 Table 10
		[['PH'], 'fillet', ['PA', 'PB', 'PC', 'PD', 'PE', 'PF', 'PH']], // ISO 9606-1:2012 Table 10
		[['PJ'], 'fillet', ['PA', 'PB', 'PD', 'PE', 'PG', 'PJ']], // ISO 9606-1:2012 Table 10
		[['PF', 'PC'], 'butt', ['PA', 'PC', 'PF']] // several tests: the union, ISO 9606-1:2012 Table 9
	])('%j %s', (tests, weld, q) => {
		expect(welderPositionsIso(tests, weld).qualified).toEqual(q);
	});
	it('names positions it does not know', () => {
		expect(welderPositionsIso(['3G'], 'butt').unknown).toEqual(['3G']);
	});
});

describe('filler and parent material groups (5.5, Tables 2 and 3)', () => {
	it.each([
		['FM1', ['FM1', 'FM2']], // ISO 9606-1:2012 Table 3
		['FM2', ['FM1', 'FM2']], // ISO 9606-1:2012 Table 3
		['FM3', ['FM1', 'FM2', 'FM3']], // ISO 9606-1:2012 Table 3
		['FM4', ['FM1', 'FM2', 'FM3', 'FM4']], // ISO 9606-1:2012 Table 3
		['FM5', ['FM5']], // ISO 9606-1:2012 Table 3
		['FM6', ['FM5', 'FM6']] // ISO 9606-1:2012 Table 3
	])('%s -> %j', (g, q) => {
		expect(welderFillerGroupsIso(g)).toMatchObject({ ok: true, fillers: q });
	});
	it('any filler group covers parent material groups 1 to 11', () => {
		// ISO 9606-1:2012 5.5.2 (before: a recalled list of groups per filler group)
		for (const g of ['fm1', 'FM5', 'FM6']) {
			const r = welderFillerGroupsIso(g);
			expect(r.ok && r.parentGroups).toEqual([
				'1',
				'2',
				'3',
				'4',
				'5',
				'6',
				'7',
				'8',
				'9',
				'10',
				'11'
			]);
		}
	});
	it('refuses an unknown group', () => {
		expect(welderFillerGroupsIso('FM9').ok).toBe(false);
	});
});

describe('process, product type and weld type (5.2-5.4)', () => {
	const v = (t: object, name: string) =>
		isoWelderRanges(t).items.find((i) => i.variable === name)?.qualified;
	it.each([
		[{ process: '135' }, '135 and 138'], // solid and metal-cored wire cover each other, ISO 9606-1:2012 5.2
		[{ process: '141' }, '141 and 142, 143, 145'], // ISO 9606-1:2012 5.2
		[{ process: '142' }, '142 only'], // ISO 9606-1:2012 5.2
		[{ process: '111' }, '111 only'] // ISO 9606-1:2012 5.2
	])('process %j', (t, q) => expect(v(t, 'Process')).toBe(q));
	it.each([
		[{ product: 'plate' }, 'pipe over 500 mm'], // ISO 9606-1:2012 5.3 b) (sign not legible in the copy)
		[{ product: 'plate', rotated: true }, 'pipe over 75 mm'], // ISO 9606-1:2012 5.3 c) (sign not legible)
		[{ product: 'pipe' }, 'plate when the pipe is over 25 mm'] // ISO 9606-1:2012 5.3 a)
	])('product %j', (t, q) => expect(v(t, 'Product type')).toContain(q));
	it.each([
		[{ weld: 'butt' }, 'need the supplementary fillet test'], // ISO 9606-1 5.4 (dekra.se)
		[{ weld: 'butt', supplementaryFillet: true }, 'and fillet welds'], // ISO 9606-1 5.4 (dekra.se)
		[{ weld: 'fillet' }, 'fillet welds'] // ISO 9606-1:2012 5.4 b)
	])('weld %j', (t, q) => expect(v(t, 'Type of weld')).toContain(q));
});
