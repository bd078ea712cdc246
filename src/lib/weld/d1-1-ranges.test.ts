import { describe, expect, it } from 'vitest';
import { d11DiameterRange, d11ThicknessRange, d11WpsPositions } from './d1-1-ranges';

// AWS D1.1/D1.1M:2015 Table 4.2 (CJP groove, plate) and Table 4.1 (WPS positions). // from memory
describe('D1.1 WPS thickness qualified', () => {
	it.each([
		// 1/8 in = 3.175 mm exactly (1 in = 25.4 mm, 16 CFR 500.19 / NIST)
		[6.35, 3.175, 12.7], // 1/4 in: 1/8 in to 2T // from memory
		[9.525, 3.175, 19.05], // 3/8 in: 1/8 in to 2T // from memory
		[19.05, 3.175, 38.1], // 3/4 in: 1/8 in to 2T // from memory
		[25.4, 3.175, null] // 1 in and over: unlimited // from memory
	])('T = %s mm: %s to %s mm', (t, min, max) => {
		const r = d11ThicknessRange(t);
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.minMm).toBeCloseTo(min, 9);
		if (max === null) expect(r.maxMm).toBeNull();
		else expect(r.maxMm).toBeCloseTo(max, 9);
	});
	it('a 1/8 in test plate qualifies its own thickness (no rounding past it)', () => {
		const r = d11ThicknessRange(3.175);
		expect(r.ok && r.minMm <= 3.175).toBe(true); // 1/8 <= T <= 3/8 in: 1/8 in to 2T // from memory
	});
	it('has no row under 1/8 in and says so', () => {
		expect(d11ThicknessRange(2).ok).toBe(false);
	});
	it('GMAW-S: not prequalified; no D1.1 GMAW-S thickness limit is modelled', () => {
		const r = d11ThicknessRange(6.35, 'short-circuit');
		expect(r.ok && r.notes[0]).toContain('not prequalified'); // D1.1:2000 3.2.2 (public copy)
		expect(r.ok && r.source.kind).toBe('published');
	});
});

describe('D1.1 WPS diameter and positions', () => {
	it.each([
		// AWS D1.1/D1.1M:2015 Table 9.10, job-size test pipes (public copy, ro.scribd.com/document/435989338)
		[60.3, 60.3], // under 24 in: the test diameter and over
		[610, 609.6], // 24 in and over: 24 in and over
		[914.4, 609.6] // 24 in and over: 24 in and over
	])('OD %s mm -> from %s mm', (od, min) => {
		const r = d11DiameterRange(od);
		expect(r).toMatchObject({ ok: true, maxMm: null });
		expect(r.ok && r.minMm).toBeCloseTo(min, 9);
		expect(r.ok && r.source.kind).toBe('published');
	});
	it.each([
		[['1G'], ['F']], // from memory
		[['3G'], ['V']], // from memory
		[['5G'], ['F', 'V', 'OH']], // from memory
		[['6G'], ['F', 'H', 'V', 'OH']], // from memory
		[
			['2G', '3G'],
			['H', 'V']
		] // union // from memory
	])('%j -> %j', (t, p) => expect(d11WpsPositions(t).positions).toEqual(p));
});
