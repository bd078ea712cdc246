// Property tests for the ISO, EN 1011-2, D1.1 and ASME variable modules: no input throws, and
// no range comes out empty or inverted. The seed is printed so a failure can be replayed.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { asmeChanges, classifyChange } from './asme-variables';
import { ceMethodA, cetPreheat } from './cet-preheat';
import { d11DiameterRange, d11ThicknessRange, d11WpsPositions } from './d1-1-ranges';
import { codeRule, thicknessByCode } from './governing-code';
import { isoProcedureRanges } from './iso-15614-procedure';
import { isoDiameterRange, isoThicknessRange } from './iso-15614-ranges';
import {
	isoWelderRanges,
	welderDiameterIso,
	welderPositionsIso,
	welderThicknessIso
} from './iso-9606-ranges';
import { isoWelderValidity } from './iso-9606-validity';

const seed = Number(process.env.FC_SEED ?? Date.now() % 2 ** 31);
console.log(`iso-properties fast-check seed: ${seed} (FC_SEED=${seed} to replay)`);
const opts = { seed, numRuns: 300 };

const sane = (r: { ok: boolean; min?: number; max?: number | null }) => {
	if (!r.ok) return true;
	return (
		Number.isFinite(r.min) &&
		(r.max === null || (Number.isFinite(r.max) && r.max! >= r.min!)) &&
		r.min! > 0
	);
};

describe('never throws on any input', () => {
	it('all entry points', () => {
		fc.assert(
			fc.property(fc.anything(), fc.anything(), fc.anything(), (a, b, c) => {
				isoThicknessRange(a, b);
				isoDiameterRange(a);
				isoProcedureRanges(a);
				isoWelderRanges(a);
				welderThicknessIso(a, b);
				welderDiameterIso(a);
				welderPositionsIso(a, b);
				isoWelderValidity(a as never, b);
				cetPreheat(a as never);
				ceMethodA(a as never);
				d11ThicknessRange(a, b as never);
				d11DiameterRange(a);
				d11WpsPositions(a);
				codeRule(a, b, c);
				thicknessByCode(a, b, {});
				classifyChange(a, b, c);
				asmeChanges(a as never, b as never, c === true);
			}),
			opts
		);
	});
});

describe('ranges are never empty or inverted', () => {
	const t = fc.double({ min: 0.01, max: 1500, noNaN: true });
	it('thickness and diameter, every code', () => {
		fc.assert(
			fc.property(
				t,
				fc.constantFrom('single', 'multi'),
				fc.constantFrom('butt', 'fillet'),
				(x, runs, weld) => {
					expect(sane(isoThicknessRange(x, runs))).toBe(true);
					expect(sane(isoDiameterRange(x))).toBe(true);
					expect(sane(welderThicknessIso(x, weld))).toBe(true);
					expect(sane(welderDiameterIso(x))).toBe(true);
					const d = d11ThicknessRange(x);
					expect(!d.ok || d.maxMm === null || d.maxMm >= d.minMm).toBe(true);
					for (const code of ['asme-ix', 'aws-d1.1', 'iso-15614-1']) {
						const r = thicknessByCode(code, x, { transfer: 'short-circuit' });
						expect(!r.ok || r.maxMm === null || r.maxMm >= r.minMm).toBe(true);
					}
				}
			),
			opts
		);
	});
	it('every range item of a random coupon', () => {
		const coupon = fc.record(
			{
				level: fc.constantFrom(1, 2),
				thicknessMm: t,
				outsideDiameterMm: t,
				heatInputKjPerMm: fc.double({ min: 0.01, max: 10, noNaN: true }),
				impact: fc.boolean(),
				hardness: fc.boolean(),
				preheatC: fc.double({ min: -50, max: 500, noNaN: true }),
				runs: fc.constantFrom('single', 'multi')
			},
			{ requiredKeys: [] }
		);
		fc.assert(
			fc.property(coupon, (c) => {
				for (const i of isoProcedureRanges(c).items)
					if (i.range) expect(i.range.max === null || i.range.max >= i.range.min).toBe(true);
			}),
			opts
		);
	});
});
