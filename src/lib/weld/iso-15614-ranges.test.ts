import { describe, expect, it } from 'vitest';
import {
	isoDiameterRange,
	isoHeatInputRange,
	isoMaterialGroups,
	isoThicknessRange
} from './iso-15614-ranges';
import { isoProcedureRanges } from './iso-15614-procedure';

// Worked cases computed by hand from ISO 15614-1:2017+A1:2019 clause 8, level 2 (BS EN ISO
// 15614-1:2017+A1:2019 and UNI EN ISO 15614-1:2017, read from text copies of the standard:
// reference/sources.ts ISO_15614_1_2017).
const item = (c: object, variable: string) =>
	isoProcedureRanges(c).items.find((i) => i.variable.startsWith(variable));

describe('parent material thickness, butt welds (8.3.2, Table 7)', () => {
	it.each([
		[2, 'multi', 1, 4], // t <= 3: 0.5t to 2t (one cell across the levels), ISO 15614-1:2017 Table 7
		[10, 'multi', 3, 20], // 3 < t <= 12: 3 to 2t, ISO 15614-1:2017 Table 7
		[20, 'multi', 10, 40], // 12 < t <= 20: 0.5t to 2t, ISO 15614-1:2017 Table 7
		[60, 'multi', 30, 120], // 40 < t <= 100: 0.5t to 2t, ISO 15614-1:2017 Table 7
		[150, 'multi', 50, 300], // 100 < t <= 150: 50 to 2t, ISO 15614-1:2017 Table 7
		[2, 'single', 1, 4], // t <= 3, single run too: 0.5t to 2t, ISO 15614-1:2017 Table 7
		[10, 'single', 5, 13], // single run 3 < t <= 12: 0.5t (3 min) to 1.3t, ISO 15614-1:2017 Table 7
		[5, 'single', 3, 6.5], // 0.5t = 2.5 is below the 3 mm floor, ISO 15614-1:2017 Table 7
		[20, 'single', 10, 22], // single run 12 < t <= 20: 0.5t to 1.1t, ISO 15614-1:2017 Table 7
		[40, 'single', 20, 44] // single run 20 < t <= 40: 0.5t to 1.1t, ISO 15614-1:2017 Table 7
	])('t = %s mm, %s-run: %s to %s mm', (t, runs, min, max) => {
		const r = isoThicknessRange(t, runs);
		expect(r).toMatchObject({ ok: true, min, max });
	});
	it('single run over 40 mm falls back to the multi-run row and says so', () => {
		// ISO 15614-1:2017 Table 7 gives no single-run range over 40 mm (the 2004 Table 5 did, to 100 mm).
		const r = isoThicknessRange(120, 'single');
		expect(r).toMatchObject({ ok: true, min: 50, max: 240 }); // 50 to 2t, ISO 15614-1:2017 Table 7
		if (r.ok) expect(r.notes[0]).toContain('not covered');
		const m = isoThicknessRange(60, 'single');
		expect(m).toMatchObject({ ok: true, min: 30, max: 120 }); // multi-run 0.5t to 2t, Table 7
		if (m.ok) expect(m.notes[0]).toContain('not covered');
	});
	it('each row says where it comes from', () => {
		const read = isoThicknessRange(10);
		expect(read.ok && read.source.kind).toBe('published');
		const thin = isoThicknessRange(2);
		expect(thin.ok && thin.source.kind).toBe('published');
	});
	it('refuses nonsense with a message', () => {
		for (const x of [0, -1, NaN, '10', null]) expect(isoThicknessRange(x).ok).toBe(false);
	});
});

describe('pipe outside diameter (8.3.3, Table 9)', () => {
	// ISO 15614-1:2017 Table 9 (level 2): D qualifies 0.5D and over. The 2004 Table 6 rows
	// (D <= 25 mm: 0.5D to 2D; over 25 mm: 0.5D, 25 mm min) were what Beadline had before.
	it.each([
		[20, 10, null], // 0.5D and over, ISO 15614-1:2017 Table 9
		[25, 12.5, null], // ISO 15614-1:2017 Table 9
		[60, 30, null], // ISO 15614-1:2017 Table 9
		[40, 20, null] // no 25 mm floor in 2017, ISO 15614-1:2017 Table 9
	])('D = %s mm: %s to %s', (d, min, max) => {
		expect(isoDiameterRange(d)).toMatchObject({ ok: true, min, max });
	});
	it('a plate test covers pipe over 500 mm OD (8.3.3)', () => {
		expect(item({ joint: 'butt-plate' }, 'Pipe')?.range).toMatchObject({ min: 500, max: null });
	});
});

describe('heat input (8.4.7)', () => {
	it.each([
		[1.5, true, false, null, 1.88], // impact: upper limit +25 %, ISO 15614-1:2017 8.4.7
		[2, false, true, 1.5, null], // hardness: lower limit -25 %, ISO 15614-1:2017 8.4.7
		[1.2, true, true, 0.9, 1.5], // both, ISO 15614-1:2017 8.4.7
		[1.2, false, false, null, null] // neither: not limited, ISO 15614-1:2017 8.4.7
	])('Q %s kJ/mm, impact %s, hardness %s', (q, imp, hard, min, max) => {
		expect(isoHeatInputRange(q, imp, hard)).toMatchObject({ ok: true, min, max });
	});
	it('says "not limited" without impact or hardness requirements', () => {
		expect(item({ heatInputKjPerMm: 1.2 }, 'Heat')?.qualified).toContain('not limited');
	});
});

describe('parent material group (8.3.1, Table 5, ISO/TR 15608)', () => {
	it.each([
		['1.1', ['1.1']], // equal or lower yield strength, ISO 15614-1:2017 Table 5 note a
		['1.2', ['1.1', '1.2']], // ISO 15614-1:2017 Table 5 note a
		['1.3', ['1.1', '1.2', '1.3']], // ISO 15614-1:2017 Table 5 note a
		['8', ['8']], // the same sub-group, ISO 15614-1:2017 Table 5 note b
		['1.4', ['1.4']] // weather-resistant steels: itself only // from memory
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
		[{ position: 'PA' }, 'all positions'], // no impact/hardness: any position qualifies all, ISO 15614-1:2017 8.4.2
		[{ position: 'PF' }, 'all positions'], // ISO 15614-1:2017 8.4.2
		[{ position: 'PF', impact: true }, 'PF; all positions only when'] // ISO 15614-1:2017 8.4.2
	])('position %j', (c, text) => {
		expect(item(c, 'Welding position')?.qualified).toContain(text);
	});
	it.each([
		[{ joint: 'butt-plate' }, 'butt welds, and fillet welds'], // ISO 15614-1:2017 8.4.3 a), level 2
		[{ joint: 'fillet' }, 'fillet welds only'], // ISO 15614-1:2017 8.4.3 e), level 2
		[{ joint: 'butt-pipe', side: 'one-side-no-backing' }, 'without backing'] // ISO 15614-1:2017 8.4.3 f), level 2
	])('joint %j', (c, text) => {
		expect(item(c, 'Joint')?.qualified).toContain(text);
	});
	it.each([
		[{ process: '135', transfer: 'short-circuit' }, '135 only, short-circuit transfer only'], // ISO 15614-1:2017+A1 8.4.1, 8.5.2.3
		[{ process: '135', transfer: 'spray' }, 'not short-circuit'], // ISO 15614-1:2017+A1 8.5.2.3
		[{ process: '141' }, '141 only'] // ISO 15614-1:2017 8.4.1
	])('process %j', (c, text) => {
		expect(item(c, 'Process')?.qualified).toContain(text);
	});
	it.each([
		[{ filler: { designation: 'ISO 14341-A G 42 4 M21 3Si1' } }, 'same or lower hydrogen'], // ISO 15614-1:2017 8.4.4, level 2
		[{ filler: { designation: 'E 42 4 B 42 H5', make: 'Brand X' }, impact: true }, 'make tested'], // ISO 15614-1:2017 8.4.4 (there for impact below -20 degC with 111, 114, 12, 136, 132; Beadline asks it for any impact test, the stricter reading)
		[{ filler: { designation: 'E 42 4 B 42 H5', make: 'Brand X' } }, 'hydrogen'] // ISO 15614-1:2017 8.4.4, level 2
	])('filler %j', (c, text) => {
		expect(item(c, 'Filler')?.qualified).toContain(text);
	});
	it.each([
		[{ gas: 'M21' }, 'M21'], // nominal composition as tested, ISO 15614-1:2017 8.5.2.1
		[{ currentType: 'DCEP' }, 'DCEP as tested'], // ISO 15614-1:2017 8.4.6
		[{ currentType: 'AC', process: '111' }, 'AC also covers DC'] // ISO 15614-1:2017 8.4.6
	])('gas and current %j', (c, text) => {
		const i = isoProcedureRanges(c).items.at(-1);
		expect(i?.qualified).toContain(text);
	});
	it.each([
		[{ preheatC: 100 }, 'Preheat', 'at least 50 °C'], // 100 less 50 degC, ISO 15614-1:2017 8.4.8
		[{ interpassMaxC: 250 }, 'Interpass', 'at most 300 °C'], // 250 plus 50 degC, ISO 15614-1:2017 8.4.9
		[{ interpassMaxC: 150, materialGroup: '8.1' }, 'Interpass', 'at most 150 °C'], // group 8, level 2: highest reached, 8.4.9
		[{ pwht: false }, 'Post-weld', 'no heat treatment'] // addition not permitted, ISO 15614-1:2017 8.4.11
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
