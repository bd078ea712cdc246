import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseBaseMetal } from './base-metal';
import { parseFiller } from './filler';
import {
	carbonEquivalentIIW,
	checkCarbonEquivalent,
	checkPreheat,
	d11MinimumPreheat
} from './preheat';
import { fToC, inToMm } from './units';

describe('IIW carbon equivalent', () => {
	it('worked example: C 0.20, Mn 1.00, Cr 0.10, Mo 0.02, V 0.01, Ni 0.10, Cu 0.20', () => {
		// IIW: CE = C + Mn/6 + (Cr+Mo+V)/5 + (Ni+Cu)/15
		//        = 0.20 + 0.1667 + 0.026 + 0.02 = 0.4127
		const ce = carbonEquivalentIIW({
			C: 0.2,
			Mn: 1.0,
			Cr: 0.1,
			Mo: 0.02,
			V: 0.01,
			Ni: 0.1,
			Cu: 0.2
		});
		expect(ce).toBeCloseTo(0.41267, 5);
	});
	it('plain carbon-manganese: C 0.25, Mn 0.90 -> 0.40', () => {
		expect(carbonEquivalentIIW({ C: 0.25, Mn: 0.9 })).toBeCloseTo(0.4, 10);
	});
	it('needs carbon; ignores nonsense', () => {
		expect(carbonEquivalentIIW({ Mn: 1 })).toBeNull();
		expect(carbonEquivalentIIW(undefined)).toBeNull();
		expect(carbonEquivalentIIW({ C: 0.1, Mn: -5 })).toBeCloseTo(0.1, 10);
	});
	it('guidance (common practice): up to 0.40 ok, to 0.60 caution, above outside', () => {
		const at = (C: number) =>
			checkCarbonEquivalent({ s: { process: 'GMAW', chemistry: { C } }, system: 'imperial' })
				?.status;
		expect(at(0.4)).toBe('ok');
		expect(at(0.41)).toBe('caution');
		expect(at(0.6)).toBe('caution');
		expect(at(0.61)).toBe('outside');
	});
});

describe('AWS D1.1:2015 Table 3.3 category B', () => {
	const min = (inches: number) => d11MinimumPreheat(inToMm(inches))?.minF ?? null;
	it('band edges in inches', () => {
		expect(min(0.1)).toBeNull(); // below 1/8 in: not covered
		expect(min(1 / 8)).toBe(32); // AWS D1.1 Table 3.3: 1/8 to 3/4 incl. -> 32 F
		expect(min(3 / 4)).toBe(32); // AWS D1.1 Table 3.3
		expect(min(0.7501)).toBe(50); // over 3/4 thru 1-1/2 incl. -> 50 F
		expect(min(1.5)).toBe(50); // AWS D1.1 Table 3.3
		expect(min(1.5001)).toBe(150); // over 1-1/2 thru 2-1/2 incl. -> 150 F
		expect(min(2.5)).toBe(150); // AWS D1.1 Table 3.3
		expect(min(2.5001)).toBe(225); // over 2-1/2 -> 225 F
		expect(min(6)).toBe(225); // AWS D1.1 Table 3.3
	});
	it('metric users get the table’s mm edges', () => {
		expect(d11MinimumPreheat(20, 'metric')?.minC).toBe(0); // 3 to 20 incl. -> 0 C
		expect(d11MinimumPreheat(20.1, 'metric')?.minC).toBe(10); // over 20 thru 38 -> 10 C
		expect(d11MinimumPreheat(38, 'metric')?.minC).toBe(10);
		expect(d11MinimumPreheat(65, 'metric')?.minC).toBe(65); // over 38 thru 65 -> 65 C
		expect(d11MinimumPreheat(65.1, 'metric')?.minC).toBe(110); // over 65 -> 110 C
		expect(d11MinimumPreheat(20)?.minF).toBe(50); // 20 mm is over 3/4 in on the inch edges
	});
	const ctx = (
		inches: number,
		preheatF: number,
		spec = 'A36',
		process: 'GMAW' | 'SMAW' | 'GTAW' = 'GMAW',
		filler?: string
	) => {
		const metal = parseBaseMetal(spec);
		const f = filler ? parseFiller(filler) : undefined;
		return {
			s: { process, thicknessMm: inToMm(inches), preheatC: fToC(preheatF) },
			system: 'imperial' as const,
			metal: metal.ok ? metal.metal : undefined,
			family: metal.ok ? metal.metal.family : undefined,
			filler: f?.ok ? f.filler : undefined
		};
	};
	it('below the minimum is outside; at it is ok', () => {
		expect(checkPreheat(ctx(1, 50))).toMatchObject({
			status: 'ok',
			expected: { min: 50, unit: 'degF' },
			field: 'preheat'
		});
		expect(checkPreheat(ctx(1, 40))?.status).toBe('outside');
		expect(checkPreheat(ctx(2, 150))?.status).toBe('ok');
		expect(checkPreheat(ctx(3, 200))?.status).toBe('outside');
	});
	it('cold base metal below 32 F is flagged (D1.1:2015 Table 3.3 note a, as quoted publicly)', () => {
		const f = checkPreheat(ctx(0.25, 20));
		expect(f?.status).toBe('outside');
		expect(f?.message).toContain('70 °F');
	});
	it('left out where category B does not apply', () => {
		expect(checkPreheat(ctx(1, 50, '304'))).toBeNull(); // stainless
		expect(checkPreheat(ctx(1, 50, 'A1011'))).toBeNull(); // not in the category B list
		expect(checkPreheat(ctx(1, 50, 'A36', 'SMAW', 'E6010'))).toBeNull(); // category A electrode
		expect(checkPreheat(ctx(1, 50, 'A36', 'SMAW', 'E7018'))?.status).toBe('ok');
		expect(
			checkPreheat({
				s: { process: 'GMAW', thicknessMm: 25 },
				system: 'imperial',
				family: 'carbon-steel'
			})
		).toBeNull();
	});
});

it('never throws (fast-check)', () => {
	fc.assert(
		fc.property(fc.anything(), fc.double(), (x, d) => {
			carbonEquivalentIIW(x as never);
			d11MinimumPreheat(d);
		})
	);
});
