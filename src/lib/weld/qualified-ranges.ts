// Ranges qualified: ASME IX QW-451.1 (procedure thickness), QW-461.9 (welder positions),
// QW-452.1(b) (welder deposit thickness) and QW-452.3 (welder pipe diameter).
import {
	QW_451_1,
	QW_451_1_THICK_DEPOSIT,
	type Limit,
	type Qw451Row
} from '$reference/asme-ix-qw-451';
import { QW_452_1B, QW_452_3 } from '$reference/asme-ix-qw-452';
import { ALL_POSITIONS, QW_461_9, type WeldPosition } from '$reference/asme-ix-qw-461-9';
import {
	ASME_IX_QW_403_10,
	ASME_IX_QW_451_1,
	ASME_IX_QW_452_1B,
	ASME_IX_QW_452_3,
	ASME_IX_QW_461_9
} from '$reference/sources';
import type { Transfer } from '$reference/types';
import { isNum, sourceOf, type FindingSource } from './findings';
import { lengthToMm, mmToLength, type LengthUnit } from './units';

export interface Length {
	value: number;
	unit: LengthUnit;
}

type Band = { over?: number; atLeast?: number; lessThan?: number; upTo?: number };
const EPS = 1e-9;
const within = (t: number, b: Band): boolean =>
	(b.over === undefined || t > b.over + EPS) &&
	(b.atLeast === undefined || t >= b.atLeast - EPS) &&
	(b.lessThan === undefined || t < b.lessThan - EPS) &&
	(b.upTo === undefined || t <= b.upTo + EPS);

const tidy = (v: number, unit: LengthUnit): number =>
	unit === 'in' ? Math.round(v * 10000) / 10000 : Math.round(v * 100) / 100;

const limitValue = (l: Limit, T: number, unit: LengthUnit): number =>
	'timesT' in l ? l.timesT * T : l.fixed[unit];

const ok = (v: unknown): v is Length =>
	typeof v === 'object' &&
	v !== null &&
	isNum((v as Length).value) &&
	(v as Length).value > 0 &&
	((v as Length).unit === 'in' || (v as Length).unit === 'mm');

export interface PqrRanges {
	row: string;
	baseMetal: { min: Length; max: Length };
	depositedMax?: Length;
	notes: string[];
	source: FindingSource;
}

export type PqrRangesResult = ({ ok: true } & PqrRanges) | { ok: false; message: string };

/**
 * QW-451.1 ranges for a groove-weld PQR. The row is chosen with the edges of the unit system the
 * coupon thickness was given in; fixed limits use the code's own value in that system (3/16 in or
 * 5 mm). The deposit answer is in the deposit's unit. Short-circuit GMAW under 1/2 in (13 mm)
 * takes the QW-403.10 / QW-404.32 1.1 limits (as stated in API RP 577 11.3; named in the notes).
 */
export function pqrThicknessRange(
	coupon: unknown,
	deposited?: unknown,
	transfer?: Transfer
): PqrRangesResult {
	if (!ok(coupon))
		return { ok: false, message: 'Give the coupon thickness T as a length above zero.' };
	if (deposited !== undefined && !ok(deposited))
		return {
			ok: false,
			message: 'Give the deposited weld metal thickness t as a length above zero.'
		};
	const unit = coupon.unit;
	const T = coupon.value;
	const row: Qw451Row | undefined = QW_451_1.find((r) => within(T, r[unit]));
	if (!row) return { ok: false, message: 'No QW-451.1 row matches that thickness.' };
	const notes: string[] = [];
	let min = limitValue(row.min, T, unit);
	let max = limitValue(row.max, T, unit);
	const shortCircuit = transfer === 'short-circuit' && lengthToMm(T, unit) < 13 - EPS;
	if (shortCircuit) {
		max = 1.1 * T;
		notes.push('GMAW short-circuit, coupon under 1/2 in (13 mm): maximum 1.1T (QW-403.10).');
	}
	if (min > max) min = max;
	const result: PqrRanges = {
		row: row.label,
		baseMetal: { min: { value: tidy(min, unit), unit }, max: { value: tidy(max, unit), unit } },
		notes,
		source: sourceOf(shortCircuit ? ASME_IX_QW_403_10 : ASME_IX_QW_451_1)
	};
	if (deposited !== undefined && ok(deposited)) {
		const du = deposited.unit;
		const t = deposited.value;
		const tInCouponUnit = mmToLength(lengthToMm(t, du), unit);
		if (tInCouponUnit > T + EPS)
			notes.push('The deposit t is thicker than the coupon T; check the entries.');
		const col = row.depositedWhenThick;
		let dmax = 2 * t;
		// t of 3/4 in (19 mm) and over takes the thick column: a multiple of T or a fixed length.
		if (col && t >= QW_451_1_THICK_DEPOSIT[du] - EPS)
			dmax = 'fixed' in col ? col.fixed[du] : mmToLength(lengthToMm(col.timesT * T, unit), du);
		if (shortCircuit && lengthToMm(t, du) < 13 - EPS) {
			dmax = 1.1 * t;
			notes.push('GMAW short-circuit, deposit under 1/2 in (13 mm): maximum 1.1t (QW-404.32).');
		}
		result.depositedMax = { value: tidy(dmax, du), unit: du };
	}
	return { ok: true, ...result };
}

export interface PositionsQualified {
	/** Groove welds in plate, and pipe over 24 in (610 mm) OD. */
	groove: WeldPosition[];
	/** Groove welds in pipe 24 in (610 mm) OD and under (from plate tests: 2-7/8 in OD and over). */
	groovePipe: WeldPosition[];
	fillet: WeldPosition[];
	/** Test positions given that the table does not know. */
	unknown: string[];
	source: FindingSource;
}

export const TEST_POSITIONS = [...new Set(QW_461_9.map((r) => r.test))];

const order = (set: Set<WeldPosition>): WeldPosition[] => ALL_POSITIONS.filter((p) => set.has(p));

/**
 * QW-461.9 positions qualified by one or more test positions. Several tests qualify the union
 * of their rows, which is what the table's combination rows print.
 */
export function welderPositions(tests: unknown): PositionsQualified {
	const list = Array.isArray(tests) ? tests.slice(0, 20) : [];
	const groove = new Set<WeldPosition>();
	const groovePipe = new Set<WeldPosition>();
	const fillet = new Set<WeldPosition>();
	const unknown: string[] = [];
	for (const t of list) {
		const k = typeof t === 'string' ? t.trim().toUpperCase() : '';
		const rows = QW_461_9.filter((r) => r.test === k);
		if (rows.length === 0) {
			unknown.push(
				typeof t === 'string' ? t.slice(0, 10) : typeof t === 'number' ? String(t) : '?'
			);
			continue;
		}
		for (const r of rows) {
			r.groove.forEach((p) => groove.add(p));
			r.groovePipe.forEach((p) => groovePipe.add(p));
			r.fillet.forEach((p) => fillet.add(p));
		}
	}
	return {
		groove: order(groove),
		groovePipe: order(groovePipe),
		fillet: order(fillet),
		unknown,
		source: sourceOf(ASME_IX_QW_461_9)
	};
}

/** QW-452.1(b): 2t, or unlimited ("maximum to be welded") from 1/2 in (13 mm) with 3 layers. */
export function welderDepositThickness(
	deposit: unknown,
	layers?: number
): { ok: true; max: Length | 'unlimited'; source: FindingSource } | { ok: false; message: string } {
	if (!ok(deposit))
		return { ok: false, message: 'Give the deposit thickness t as a length above zero.' };
	const { value: t, unit } = deposit;
	const source = sourceOf(ASME_IX_QW_452_1B);
	if (
		isNum(layers) &&
		layers >= QW_452_1B.minLayersForUnlimited &&
		t >= QW_452_1B.unlimitedFrom[unit] - EPS
	)
		return { ok: true, max: 'unlimited', source };
	return { ok: true, max: { value: tidy(QW_452_1B.timesT * t, unit), unit }, source };
}

/** QW-452.3 groove-weld diameter limits: smallest OD qualified (the largest is unlimited). */
export function welderDiameterRange(
	od: unknown
):
	| { ok: true; min: Length | 'size welded'; max: 'unlimited'; source: FindingSource }
	| { ok: false; message: string } {
	if (!ok(od))
		return { ok: false, message: 'Give the coupon outside diameter as a length above zero.' };
	const row = QW_452_3.find((r) => within(od.value, r[od.unit]));
	if (!row) return { ok: false, message: 'No QW-452.3 row matches that diameter.' };
	const min =
		row.minQualified === null ? 'size welded' : { value: row.minQualified[od.unit], unit: od.unit };
	return { ok: true, min, max: 'unlimited', source: sourceOf(ASME_IX_QW_452_3) };
}
