import { describe, expect, it } from 'vitest';
import {
	carbonEquivalentCET,
	ceMethodA,
	cetPreheat,
	combinedThickness,
	hydrogenScale
} from './cet-preheat';

// EN 1011-2:2001 Annex C.3: CET = C + (Mn+Mo)/10 + (Cr+Cu)/20 + Ni/40 and
// Tp = 697 CET + 160 tanh(d/35) + 62 HD^0.35 + (53 CET - 32) Q - 328 (formula as reprinted on
// a public preheat calculator, indugrid.net). The worked cases below were computed by hand from
// that formula (no published worked example with numbers was found in the search corpora).
describe('CET (EN 1011-2 C.3)', () => {
	it.each([
		[{ C: 0.18, Mn: 1.4 }, 0.32], // 0.18 + 1.4/10
		[{ C: 0.15, Mn: 1.5, Cr: 0.1, Cu: 0.2, Ni: 0.3 }, 0.3225], // 0.15 + 0.15 + 0.015 + 0.0075
		[{ C: 0.2, Mn: 1.2, Mo: 0.25, Cr: 1.0 }, 0.395], // 0.2 + 0.145 + 0.05
		[{ C: 0.1 }, 0.1] // carbon alone: CET = C (EN 1011-2 C.3 formula)
	])('%j -> %s', (chem, cet) => {
		expect(carbonEquivalentCET(chem)).toBeCloseTo(cet, 6);
	});
	it('needs carbon', () => {
		expect(carbonEquivalentCET({ Mn: 1 })).toBeNull();
		expect(carbonEquivalentCET(undefined)).toBeNull();
	});
});

describe('preheat Tp (EN 1011-2 C.3)', () => {
	it.each([
		// Each Tp below: hand-computed from the EN 1011-2:2001 C.3 formula above (no published worked example found).
		[{ C: 0.18, Mn: 1.4 }, 30, 5, 1.5, 92.5], // EN 1011-2:2001 C.3 formula, by hand: CET 0.32, 30 mm, HD 5, 1.5 kJ/mm
		[{ C: 0.15, Mn: 1.5, Cr: 0.1, Cu: 0.2, Ni: 0.3 }, 50, 10, 1.0, 163.3], // EN 1011-2:2001 C.3 formula, by hand
		[{ C: 0.2, Mn: 1.2, Mo: 0.25, Cr: 1.0 }, 25, 5, 2.0, 132.2], // EN 1011-2:2001 C.3 formula, by hand
		[{ C: 0.16, Mn: 1.45 }, 40, 10, 1.2, 134.8] // EN 1011-2:2001 C.3 formula, by hand
	])('%j, d %s mm, HD %s, Q %s -> %s °C', (chemistry, d, hd, q, tp) => {
		const r = cetPreheat({ chemistry, thicknessMm: d, hydrogen: hd, heatInputKjPerMm: q });
		expect(r.ok && r.preheatC).toBeCloseTo(tp, 0);
		expect(r.ok && r.outsideValidity).toEqual([]);
		expect(r.ok && r.source.kind).toBe('published');
	});
	// The method's validity bounds (CET 0.2-0.5, thickness 10-90 mm): from memory, listed unverified in
	// reference/README.md.
	it('a low result says no preheat from this method, and a CET under 0.2 is out of range', () => {
		const r = cetPreheat({
			chemistry: { C: 0.1, Mn: 0.9 },
			thicknessMm: 20,
			hydrogen: 3,
			heatInputKjPerMm: 1
		});
		expect(r.ok && r.message).toContain('no preheat');
		expect(r.ok && r.outsideValidity[0]).toContain('CET');
	});
	it('a thickness over 90 mm is flagged as outside the method', () => {
		const r = cetPreheat({
			chemistry: { C: 0.18, Mn: 1.4 },
			thicknessMm: 120,
			hydrogen: 5,
			heatInputKjPerMm: 1.5
		});
		expect(r.ok && r.outsideValidity.join()).toContain('thickness');
	});
	it('refuses missing inputs with a message', () => {
		expect(cetPreheat({ chemistry: { C: 0.18 } }).ok).toBe(false);
	});
});

describe('method A inputs (EN 1011-2 C.2)', () => {
	it.each([
		[20, 'A'], // > 15 ml/100 g (EN 1011-2 Table C.2, gowelding.com reprint)
		[12, 'B'], // > 10 to 15 (EN 1011-2 Table C.2, gowelding.com reprint)
		[10, 'C'], // > 5 to 10 (same table)
		[5, 'D'], // > 3 to 5 (same table)
		[4, 'D'], // > 3 to 5 (same table)
		[2, 'E'] // <= 3 (same table)
	])('HD %s -> scale %s', (hd, s) => expect(hydrogenScale(hd)).toBe(s));
	it.each([
		// Combined thickness: the sum of the heat paths (EN 1011-2:2001 C.2.4, as reprinted at
		// gowelding.com/weld/preheat/preheatinfo.htm: all paths taking heat from the weld)
		[[20, 20], 40], // butt weld of two equal plates: twice the plate (same page)
		[[10, 10, 10], 30], // T fillet: three times the thickness (same page)
		[[25, 12], 37] // two unequal heat paths add up (same page)
	])('combined thickness of %j is %s', (paths, t) => expect(combinedThickness(paths)).toBe(t));
	it('gives CE, scale and combined thickness and says where to read the preheat', () => {
		const r = ceMethodA({ chemistry: { C: 0.18, Mn: 1.4 }, hydrogen: 5, paths: [20, 20] });
		expect(r).toMatchObject({ ok: true, ce: 0.413, scale: 'D', combinedMm: 40 }); // 0.18 + 1.4/6
		expect(r.ok && r.message).toContain('does not reproduce the graphs');
	});
});
