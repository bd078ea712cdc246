import { describe, expect, it } from 'vitest';
import {
	isoWelderRanges,
	welderDiameterIso,
	welderFillerGroupsIso,
	welderPositionsIso,
	welderThicknessIso
} from './iso-9606-ranges';

// Worked cases from the rows of ISO 9606-1:2012 Tables 4, 9-13. // from memory (no copy at hand)
describe('material thickness (5.7, Tables 9 and 10)', () => {
	it.each([
		[2, 'butt', 2, 4], // t < 3: t to 2t // from memory
		[3, 'butt', 3, 6], // 3 <= t <= 12: 3 to 2t // from memory
		[10, 'butt', 3, 20], // from memory
		[12, 'butt', 3, 24], // from memory
		[15, 'butt', 5, null], // t > 12: 5 and over // from memory
		[2, 'fillet', 2, 3], // fillet t < 3: t to 3 // from memory
		[10, 'fillet', 3, null], // fillet t >= 3: 3 and over // from memory
		[3, 'fillet', 3, null] // from memory
	])('t = %s mm %s: %s to %s', (t, weld, min, max) => {
		expect(welderThicknessIso(t, weld)).toMatchObject({ ok: true, min, max });
	});
});

describe('outside pipe diameter (5.7, Table 11)', () => {
	it.each([
		[20, 20, 40], // D <= 25: D to 2D // from memory
		[25, 25, 50], // from memory
		[60, 30, null], // D > 25: 0.5D and over // from memory
		[40, 25, null], // 25 mm at least // from memory
		[114.3, 57.15, null] // from memory
	])('D = %s: %s to %s', (d, min, max) => {
		expect(welderDiameterIso(d)).toMatchObject({ ok: true, min, max });
	});
});

describe('positions (5.8, Tables 12 and 13)', () => {
	it.each([
		[['PA'], 'butt', ['PA']], // from memory
		[['PF'], 'butt', ['PA', 'PF']], // from memory
		[['PH'], 'butt', ['PA', 'PE', 'PF', 'PH']], // from memory
		[['H-L045'], 'butt', ['PA', 'PC', 'PE', 'PF', 'PH', 'H-L045']], // from memory
		[['PG'], 'butt', ['PG']], // vertical down qualifies itself // from memory
		[['PB'], 'fillet', ['PA', 'PB']], // from memory
		[['PF', 'PC'], 'butt', ['PA', 'PC', 'PF']] // several tests: the union // from memory
	])('%j %s', (tests, weld, q) => {
		expect(welderPositionsIso(tests, weld).qualified).toEqual(q);
	});
	it('names positions it does not know', () => {
		expect(welderPositionsIso(['3G'], 'butt').unknown).toEqual(['3G']);
	});
});

describe('filler and parent material groups (5.5, 5.6, Tables 2 and 4)', () => {
	it.each([
		['FM1', ['FM1', 'FM2']], // from memory
		['FM2', ['FM1', 'FM2']], // from memory
		['FM3', ['FM1', 'FM2', 'FM3']], // from memory
		['FM5', ['FM5']], // from memory
		['FM6', ['FM5', 'FM6']] // from memory
	])('%s -> %j', (g, q) => {
		expect(welderFillerGroupsIso(g)).toMatchObject({ ok: true, fillers: q });
	});
	it('FM1 covers the group 1 steels', () => {
		const r = welderFillerGroupsIso('fm1');
		expect(r.ok && r.parentGroups).toContain('1.2'); // from memory
	});
	it('refuses an unknown group', () => {
		expect(welderFillerGroupsIso('FM9').ok).toBe(false);
	});
});

describe('process, product type and weld type (5.2-5.4)', () => {
	const v = (t: object, name: string) =>
		isoWelderRanges(t).items.find((i) => i.variable === name)?.qualified;
	it.each([
		[{ process: '135' }, '135 and 138'], // solid and metal-cored wire cover each other // from memory
		[{ process: '141' }, '141 only'], // from memory
		[{ process: '111' }, '111 only'] // from memory
	])('process %j', (t, q) => expect(v(t, 'Process')).toBe(q));
	it.each([
		[{ product: 'plate' }, 'pipe over 500 mm'], // from memory
		[{ product: 'plate', rotated: true }, 'pipe over 75 mm'], // from memory
		[{ product: 'pipe' }, 'plate when the pipe is over 25 mm'] // from memory
	])('product %j', (t, q) => expect(v(t, 'Product type')).toContain(q));
	it.each([
		[{ weld: 'butt' }, 'need the supplementary fillet test'], // ISO 9606-1 5.4 (dekra.se)
		[{ weld: 'butt', supplementaryFillet: true }, 'and fillet welds'], // ISO 9606-1 5.4 (dekra.se)
		[{ weld: 'fillet' }, 'fillet welds'] // from memory
	])('weld %j', (t, q) => expect(v(t, 'Type of weld')).toContain(q));
});
