// ISO 15614-1 ranges of qualification from one test coupon (clause 8). Pure; never throws; a
// range it gives is never empty or inverted. Rows carry their source (read from the 2017 and
// 2017+A1:2019 texts): the standard the contract names decides.
import {
	ISO_15614_1_DIAMETER,
	ISO_15614_1_HEAT_INPUT,
	ISO_15614_1_MATERIAL,
	ISO_15614_1_THICKNESS,
	ISO_TR_15608_GROUPS,
	type IsoLimit
} from '$reference/iso-15614-1';
import { ISO_15614_1_2017 } from '$reference/sources';
import type { CurrentType, Transfer } from '$reference/types';
import { isNum, sourceOf, type FindingSource } from './findings';

export type IsoJoint = 'butt-plate' | 'butt-pipe' | 'fillet' | 'branch' | 't-butt';
export type IsoSide = 'both-sides' | 'one-side-backing' | 'one-side-no-backing';

export interface IsoCoupon {
	level?: 1 | 2;
	/** ISO 4063 number, e.g. "135", "141", "111". */
	process?: string;
	transfer?: Transfer;
	thicknessMm?: number;
	runs?: 'single' | 'multi';
	outsideDiameterMm?: number;
	/** Pipe welded rotated in PA or PC (widens what a plate test covers). */
	rotated?: boolean;
	joint?: IsoJoint;
	side?: IsoSide;
	/** ISO/TR 15608 subgroup, e.g. "1.2". */
	materialGroup?: string;
	heatInputKjPerMm?: number;
	impact?: boolean;
	hardness?: boolean;
	position?: string;
	currentType?: CurrentType;
	pulsed?: boolean;
	filler?: { designation?: string; make?: string };
	/** ISO 14175 designation, e.g. "M21". */
	gas?: string;
	preheatC?: number;
	interpassMaxC?: number;
	pwht?: boolean;
}

/** A numeric range; `max` null means no upper limit in the standard. */
export interface MmRange {
	min: number;
	max: number | null;
}

export interface IsoRangeItem {
	variable: string;
	clause: string;
	/** What is qualified, in the standard's terms. */
	qualified: string;
	range?: MmRange & { unit: string };
	notes: string[];
	source: FindingSource;
}

export const ISO_15614_SOURCE = sourceOf(ISO_15614_1_2017);
const r2 = (n: number): number => Math.round(n * 100) / 100;
const EPS = 1e-9;

const limit = (l: IsoLimit, t: number): number | null => {
	if (l === null) return null;
	if ('fixedMm' in l) return l.fixedMm;
	const v = l.timesT * t;
	return l.atLeastMm !== undefined ? Math.max(v, l.atLeastMm) : v;
};

/**
 * min <= max always; a lower limit above the upper one collapses onto the test value. Not rounded:
 * rounding 3.175 mm (1/8 in) to 3.18 would leave the coupon's own thickness outside its range.
 */
function ordered(min: number, max: number | null, test: number): MmRange {
	if (max === null) return { min: Math.min(min, test), max: null };
	const lo = Math.min(min, test, max);
	const hi = Math.max(max, test, lo);
	return { min: lo, max: hi };
}

/** Butt-weld parent material thickness (2017 8.3.2, Table 7, level 2 columns). */
export function isoThicknessRange(
	thicknessMm: unknown,
	runs: unknown = 'multi'
):
	| ({ ok: true; notes: string[]; source: FindingSource } & MmRange)
	| { ok: false; message: string } {
	if (!isNum(thicknessMm) || thicknessMm <= 0 || thicknessMm > 2000)
		return { ok: false, message: 'Give the test piece thickness t in mm, above zero.' };
	const t = thicknessMm;
	const row = ISO_15614_1_THICKNESS.find((x) => t > x.over + EPS && t <= x.upTo + EPS);
	if (!row) return { ok: false, message: 'No row of the thickness table matches that thickness.' };
	const notes: string[] = [];
	let band = row.multiRun;
	if (runs === 'single') {
		if (row.singleRun) band = row.singleRun;
		else
			notes.push(
				'Single-run welding over 40 mm is not covered by Table 7; the multi-run row is shown.'
			);
	}
	const min = limit(band.min, t) ?? t;
	return {
		ok: true,
		...ordered(min, limit(band.max, t), t),
		notes,
		source: sourceOf(row.source)
	};
}

/** Pipe outside diameter (2017 8.3.3, Table 9, level 2): 0.5D and over. */
export function isoDiameterRange(
	odMm: unknown
): ({ ok: true } & MmRange) | { ok: false; message: string } {
	if (!isNum(odMm) || odMm <= 0 || odMm > 20_000)
		return { ok: false, message: 'Give the pipe outside diameter D in mm, above zero.' };
	return { ok: true, ...ordered(ISO_15614_1_DIAMETER.minTimesD * odMm, null, odMm) };
}

/** Heat input: upper +25 % with impact requirements, lower -25 % with hardness requirements. */
export function isoHeatInputRange(
	q: unknown,
	impact: unknown,
	hardness: unknown
): ({ ok: true } & { min: number | null; max: number | null }) | { ok: false; message: string } {
	if (!isNum(q) || q <= 0 || q > 100)
		return { ok: false, message: 'Give the heat input of the test in kJ/mm, above zero.' };
	const h = ISO_15614_1_HEAT_INPUT;
	const max = impact === true ? r2(q * h.upperFactor) : null;
	const min = hardness === true ? r2(q * h.lowerFactor) : null;
	return { ok: true, min, max };
}

/** ISO/TR 15608 subgroups qualified by the test piece's subgroup. */
export function isoMaterialGroups(group: unknown): { qualified: string[]; known: boolean } {
	const g = typeof group === 'string' ? group.trim() : '';
	if (!Object.hasOwn(ISO_TR_15608_GROUPS, g))
		return { qualified: g ? [g.slice(0, 10)] : [], known: false };
	return {
		qualified: [...(Object.hasOwn(ISO_15614_1_MATERIAL, g) ? ISO_15614_1_MATERIAL[g]! : [g])],
		known: true
	};
}
