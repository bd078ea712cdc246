import { describe, expect, it } from 'vitest';
import {
	isoDiameterRange,
	isoHeatInputRange,
	isoMaterialGroups,
	isoThicknessRange
} from './iso-15614-ranges';
import { isoProcedureRanges } from './iso-15614-procedure';

// Worked cases computed by hand from the rows of ISO 15614-1:2017 Table 6 / 7 and 8.4 (level 2;
// the same rows as the 2004 edition Tables 5 and 6). // from memory (no copy of the standard at hand)
const item = (c: object, variable: string) =>
	isoProcedureRanges(c).items.find((i) => i.variable.startsWith(variable));

describe('parent material thickness, butt welds (8.3.2.1, Table 6)', () => {
	it.each([
		[2, 'multi', 1.4, 4], // t <= 3: 0.7t to 2t // from memory
		[10, 'multi', 3, 20], // 3 < t <= 12: 3 to 2t // from memory
		[20, 'multi', 10, 40], // 12 < t <= 100: 0.5t to 2t // from memory
		[150, 'multi', 50, 300], // t > 100: 50 to 2t // from memory
		[2, 'single', 1.4, 2.6], // single run t <= 3: 0.7t to 1.3t // from memory
		[10, 'single', 5, 13], // single run 3 < t <= 12: 0.5t (3 min) to 1.3t // from memory
		[5, 'single', 3, 6.5], // 0.5t = 2.5 is below the 3 mm floor // from memory
		[20, 'single', 10, 22] // single run 12 < t <= 100: 0.5t to 1.1t // from memory
	])('t = %s mm, %s-run: %s to %s mm', (t, runs, min, max) => {
		const r = isoThicknessRange(t, runs);
		expect(r).toMatchObject({ ok: true, min, max });
	});
	it('single run over 100 mm falls back to the multi-run row and says so', () => {
		const r = isoThicknessRange(120, 'single');
		expect(r).toMatchObject({ ok: true, min: 50, max: 240 });
		if (r.ok) expect(r.notes[0]).toContain('not covered');
	});
	it('refuses nonsense with a message', () => {
		for (const x of [0, -1, NaN, '10', null]) expect(isoThicknessRange(x).ok).toBe(false);
	});
});

describe('pipe outside diameter (8.3.2.2, Table 7)', () => {
	it.each([
		[20, 10, 40], // D <= 25: 0.5D to 2D // from memory
		[25, 12.5, 50], // on the edge: still the small row // from memory
		[60, 30, null], // D > 25: 0.5D and over // from memory
		[40, 25, null] // 0.5D = 20 is below the 25 mm floor // from memory
	])('D = %s mm: %s to %s', (d, min, max) => {
		expect(isoDiameterRange(d)).toMatchObject({ ok: true, min, max });
	});
	it('a plate test covers pipe over 500 mm OD', () => {
		expect(item({ joint: 'butt-plate' }, 'Pipe')?.range).toMatchObject({ min: 500, max: null });
	});
});

describe('heat input (8.4.7)', () => {
	it.each([
		[1.5, true, false, null, 1.88], // impact: upper limit +25 % // from memory
		[2, false, true, 1.5, null], // hardness: lower limit -25 % // from memory
		[1.2, true, true, 0.9, 1.5], // both // from memory
		[1.2, false, false, null, null] // neither: not limited // from memory
	])('Q %s kJ/mm, impact %s, hardness %s', (q, imp, hard, min, max) => {
		expect(isoHeatInputRange(q, imp, hard)).toMatchObject({ ok: true, min, max });
	});
	it('says "not limited" without impact or hardness requirements', () => {
		expect(item({ heatInputKjPerMm: 1.2 }, 'Heat')?.qualified).toContain('not limited');
	});
});

describe('parent material group (8.3.1.1, ISO/TR 15608)', () => {
	it.each([
		['1.1', ['1.1']], // from memory
		['1.2', ['1.1', '1.2']], // higher-strength subgroup covers the lower ones // from memory
		['1.3', ['1.1', '1.2', '1.3']], // from memory
		['8', ['8']], // austenitic stainless: itself only // from memory
		['1.4', ['1.4']] // from memory
	])('%s qualifies %j', (g, q) => {
		expect(isoMaterialGroups(g)).toEqual({ qualified: q, known: true });
	});
	it('an unknown group qualifies only itself and says so', () => {
		expect(isoMaterialGroups('99')).toEqual({ qualified: ['99'], known: false });
		expect(item({ materialGroup: '99' }, 'Parent material group')?.qualified).toContain('not in');
	});
});

describe('position, joint, process, filler, gas, current, preheat (8.4)', () => {
	it.each([
		[{ position: 'PA' }, 'all positions'], // no impact/hardness: one position qualifies all // from memory
		[{ position: 'PF' }, 'all positions'], // from memory
		[{ position: 'PF', impact: true }, 'PF; all positions only when'] // from memory
	])('position %j', (c, text) => {
		expect(item(c, 'Welding position')?.qualified).toContain(text);
	});
	it.each([
		[{ joint: 'butt-plate' }, 'butt welds, and fillet welds'], // from memory
		[{ joint: 'fillet' }, 'fillet welds only'], // from memory
		[{ joint: 'butt-pipe', side: 'one-side-no-backing' }, 'without backing'] // from memory
	])('joint %j', (c, text) => {
		expect(item(c, 'Joint')?.qualified).toContain(text);
	});
	it.each([
		[{ process: '135', transfer: 'short-circuit' }, '135 only, short-circuit transfer only'], // from memory
		[{ process: '135', transfer: 'spray' }, 'not short-circuit'], // from memory
		[{ process: '141' }, '141 only'] // from memory
	])('process %j', (c, text) => {
		expect(item(c, 'Process')?.qualified).toContain(text);
	});
	it.each([
		[{ filler: { designation: 'ISO 14341-A G 42 4 M21 3Si1' } }, 'same or lower hydrogen'], // from memory
		[{ filler: { designation: 'E 42 4 B 42 H5', make: 'Brand X' }, impact: true }, 'make tested'], // from memory
		[{ filler: { designation: 'E 42 4 B 42 H5', make: 'Brand X' } }, 'hydrogen'] // from memory
	])('filler %j', (c, text) => {
		expect(item(c, 'Filler')?.qualified).toContain(text);
	});
	it.each([
		[{ gas: 'M21' }, 'M21'], // ISO 14175 designation as tested // from memory
		[{ currentType: 'DCEP' }, 'DCEP as tested'], // from memory
		[{ currentType: 'AC', process: '111' }, 'AC also covers DC'] // from memory
	])('gas and current %j', (c, text) => {
		const i = isoProcedureRanges(c).items.at(-1);
		expect(i?.qualified).toContain(text);
	});
	it.each([
		[{ preheatC: 100 }, 'Preheat', 'at least 100 °C'], // lower limit = preheat at the start // from memory
		[{ interpassMaxC: 250 }, 'Interpass', 'at most 250 °C'], // upper = highest reached // from memory
		[{ pwht: false }, 'Post-weld', 'no heat treatment'] // from memory
	])('%j', (c, v, text) => {
		expect(item(c, v)?.qualified).toContain(text);
	});
});

describe('levels 1 and 2', () => {
	// BS EN ISO 15614-1:2017 national foreword: level 2 qualifies level 1, not the reverse.
	it.each([
		[{}, 2],
		[{ level: 2 }, 2],
		[{ level: 1 }, 1],
		[{ level: 3 }, 2]
	])('%j is level %s', (c, level) => {
		const r = isoProcedureRanges(c);
		expect(r.level).toBe(level);
		expect(r.notes[0]).toContain('Level 2 qualifies level 1');
		expect(r.source.kind).toBe('published');
	});
	it('level 1 says its own columns are not modelled', () => {
		expect(isoProcedureRanges({ level: 1 }).notes.join(' ')).toContain('not modelled');
	});
});
