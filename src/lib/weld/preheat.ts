// Preheat: IIW carbon equivalent and the AWS D1.1 prequalified minimum for category B steels.
import {
	D1_1_CATEGORY_B,
	D1_1_COLD_BASE_METAL,
	type PreheatRow
} from '$reference/aws-d1-1-preheat';
import { AWS_D1_1_TABLE_3_3, CE_GUIDANCE, IIW_CE } from '$reference/sources';
import type { CheckContext } from './context';
import { isNum, round, sourceOf, type Finding, type FindingStatus, guardCheck } from './findings';
import type { Chemistry } from './settings';
import { cToF, formatLength, formatTemperature, MM_PER_IN, type UnitSystem } from './units';

const pct = (n: unknown): number => (isNum(n) && n >= 0 && n <= 100 ? n : 0);

/**
 * CE(IIW) = C + Mn/6 + (Cr + Mo + V)/5 + (Ni + Cu)/15, weight percent. Missing elements count as
 * zero; null without carbon (the formula means nothing without it).
 */
export function carbonEquivalentIIW(chem: Chemistry | undefined): number | null {
	if (!chem || !isNum(chem.C) || chem.C < 0 || chem.C > 100) return null;
	const ce =
		pct(chem.C) +
		pct(chem.Mn) / 6 +
		(pct(chem.Cr) + pct(chem.Mo) + pct(chem.V)) / 5 +
		(pct(chem.Ni) + pct(chem.Cu)) / 15;
	return Number.isFinite(ce) ? ce : null;
}

/** Shop guidance on CE (common practice): up to 0.40 usually none, to 0.60 likely, above hard. */
export const CE_BANDS = { easy: 0.4, hard: 0.6 } as const;

function checkCarbonEquivalentUnguarded(ctx: CheckContext): Finding | null {
	const ce = carbonEquivalentIIW(ctx.s.chemistry);
	if (ce === null) return null;
	const v = round(ce, 2);
	const status: FindingStatus =
		ce <= CE_BANDS.easy ? 'ok' : ce <= CE_BANDS.hard ? 'caution' : 'outside';
	const message =
		status === 'ok'
			? `CE(IIW) ${v.toFixed(2)}: at or under ${CE_BANDS.easy.toFixed(2)} steel usually welds without preheat on moderate thickness.`
			: status === 'caution'
				? `CE(IIW) ${v.toFixed(2)}: over ${CE_BANDS.easy.toFixed(2)} preheat and low-hydrogen practice are usually needed; work it out for the thickness and restraint.`
				: `CE(IIW) ${v.toFixed(2)}: over ${CE_BANDS.hard.toFixed(2)} the steel is hard to weld; expect preheat, interpass control and possibly PWHT.`;
	return {
		check: 'carbon-equivalent',
		status,
		message,
		value: v,
		expected: { max: CE_BANDS.easy, unit: 'CE' },
		source: sourceOf(status === 'ok' ? IIW_CE : CE_GUIDANCE),
		field: 'chemistry'
	};
}

const inBand = (t: number, b: PreheatRow['in']): boolean =>
	(b.atLeast === undefined || t >= b.atLeast - 1e-9) &&
	(b.over === undefined || t > b.over + 1e-9) &&
	(b.upTo === undefined || t <= b.upTo + 1e-9);

/**
 * D1.1:2015 Table 3.3 category B minimum for the thickness of the thickest part, or null below
 * 1/8 in (3 mm), where the table does not apply. The band edges are the inch ones for imperial
 * users and the table's own mm ones for metric users (20 mm is "3 to 20 incl.", though it is a
 * little over 3/4 in).
 */
export function d11MinimumPreheat(
	thicknessMm: number,
	system: UnitSystem = 'imperial'
): PreheatRow | null {
	if (!isNum(thicknessMm) || thicknessMm <= 0) return null;
	if (system === 'metric') return D1_1_CATEGORY_B.find((r) => inBand(thicknessMm, r.mm)) ?? null;
	const t = thicknessMm / MM_PER_IN;
	return D1_1_CATEGORY_B.find((r) => inBand(t, r.in)) ?? null;
}

function checkPreheatUnguarded(ctx: CheckContext): Finding | null {
	const { thicknessMm, preheatC, process } = ctx.s;
	if (!isNum(thicknessMm) || !isNum(preheatC)) return null;
	if (ctx.family !== 'carbon-steel') return null;
	if (ctx.metal?.row && !ctx.metal.d11CategoryB) return null;
	// Category B covers low-hydrogen processes; SMAW with other electrodes is category A.
	if (process === 'SMAW' && ctx.filler && ctx.filler.fNumber !== 4) return null;
	const row = d11MinimumPreheat(thicknessMm, ctx.system);
	if (!row) return null;
	const minC = row.minC;
	const shown = formatTemperature(preheatC, ctx.system);
	const need = ctx.system === 'imperial' ? `${row.minF} °F` : `${row.minC} °C`;
	const thick = formatLength(thicknessMm, ctx.system);
	const assumed = ctx.metal?.row ? '' : ' (taking the steel as category B, e.g. A36)';
	const gtaw =
		process === 'GTAW'
			? ' GTAW is not listed in the 2015 table; it is treated as low-hydrogen here.'
			: '';
	const cold = cToF(preheatC) < D1_1_COLD_BASE_METAL.belowF;
	const unit = ctx.system === 'imperial' ? 'degF' : 'degC';
	const value = Math.round(ctx.system === 'imperial' ? cToF(preheatC) : preheatC);
	const min = ctx.system === 'imperial' ? row.minF : row.minC;
	if (preheatC < minC - 0.3 || cold)
		return {
			check: 'preheat',
			status: 'outside',
			message: `${shown} is below the D1.1 prequalified minimum of ${need} for ${thick}${assumed}.${cold ? ` Below 32 °F (0 °C) the base metal is to be warmed to at least 70 °F (20 °C).` : ''}${gtaw}`,
			value,
			expected: { min, unit },
			source: sourceOf(AWS_D1_1_TABLE_3_3),
			field: 'preheat'
		};
	return {
		check: 'preheat',
		status: 'ok',
		message: `${shown} meets the D1.1 prequalified minimum of ${need} for ${thick}${assumed}.${gtaw}`,
		value,
		expected: { min, unit },
		source: sourceOf(AWS_D1_1_TABLE_3_3),
		field: 'preheat'
	};
}

export const checkCarbonEquivalent = guardCheck(checkCarbonEquivalentUnguarded, null);
export const checkPreheat = guardCheck(checkPreheatUnguarded, null);
