// AWS D1.1 WPS qualification ranges: thickness and diameter, positions, and GMAW-S (short
// circuit), so a D1.1 procedure is judged by D1.1. Pure; never throws; ranges never inverted.
import {
	D1_1_DIAMETER,
	D1_1_POSITIONS_SOURCE,
	D1_1_THICKNESS,
	D1_1_WPS_POSITIONS
} from '$reference/aws-d1-1-qualification';
import { AWS_D1_1_GMAW_S, AWS_D1_1_QUALIFICATION } from '$reference/sources';
import type { Transfer } from '$reference/types';
import { isNum, sourceOf, type FindingSource } from './findings';
import { MM_PER_IN } from './units';

export interface D11Range {
	ok: true;
	row: string;
	minMm: number;
	/** null: unlimited. */
	maxMm: number | null;
	notes: string[];
	source: FindingSource;
}

/** CJP groove plate test thickness (mm) -> nominal thickness qualified (mm). */
export function d11ThicknessRange(
	thicknessMm: unknown,
	transfer?: Transfer
): D11Range | { ok: false; message: string } {
	if (!isNum(thicknessMm) || thicknessMm <= 0 || thicknessMm > 2000)
		return { ok: false, message: 'Give the test plate thickness, above zero.' };
	const T = thicknessMm / MM_PER_IN;
	const row = D1_1_THICKNESS.find((x) => T >= x.atLeastIn - 1e-9 && T < x.lessThanIn);
	if (!row)
		return {
			ok: false,
			message:
				'D1.1 WPS qualification tests start at 1/8 in (3 mm); no row for a thinner test plate.'
		};
	const minMm = Math.min(row.minIn * MM_PER_IN, thicknessMm);
	const maxMm = row.maxTimesT === null ? null : Math.max(row.maxTimesT * thicknessMm, minMm);
	const notes: string[] = [];
	if (transfer === 'short-circuit')
		notes.push(
			'GMAW-S (short circuit) is not prequalified in D1.1: its WPS is qualified by test and the Table 4.5 GMAW limits apply. No D1.1 GMAW-S thickness limit is modelled.'
		);
	return {
		ok: true,
		row: row.label,
		minMm,
		maxMm,
		notes,
		source: sourceOf(transfer === 'short-circuit' ? AWS_D1_1_GMAW_S : AWS_D1_1_QUALIFICATION)
	};
}

/** Pipe: a job-size test under 24 in qualifies its diameter and over; at 24 in and over, 24 in and over. */
export function d11DiameterRange(odMm: unknown): D11Range | { ok: false; message: string } {
	if (!isNum(odMm) || odMm <= 0 || odMm > 20_000)
		return { ok: false, message: 'Give the test pipe outside diameter, above zero.' };
	const brk = D1_1_DIAMETER.jobSizeBreakIn * MM_PER_IN;
	return {
		ok: true,
		row: odMm < brk ? 'job-size test under 24 in' : 'test 24 in and over',
		minMm: odMm < brk ? odMm : brk,
		maxMm: null,
		notes: ['Standard test pipes (2, 3, 6 and 8 in) have their own rows; not modelled.'],
		source: sourceOf(D1_1_DIAMETER.source)
	};
}

/** Production positions a WPS test position qualifies (union over several tests). */
export function d11WpsPositions(tests: unknown): {
	positions: ('F' | 'H' | 'V' | 'OH')[];
	unknown: string[];
	source: FindingSource;
} {
	const set = new Set<'F' | 'H' | 'V' | 'OH'>();
	const unknown: string[] = [];
	for (const t of Array.isArray(tests) ? tests.slice(0, 20) : [tests]) {
		const k = typeof t === 'string' ? t.trim().toUpperCase() : '';
		const row = Object.hasOwn(D1_1_WPS_POSITIONS, k) ? D1_1_WPS_POSITIONS[k] : undefined;
		if (!row) unknown.push(typeof t === 'string' ? t.slice(0, 10) : '?');
		else row.forEach((p) => set.add(p));
	}
	const order = ['F', 'H', 'V', 'OH'] as const;
	return {
		positions: order.filter((p) => set.has(p)),
		unknown,
		source: sourceOf(D1_1_POSITIONS_SOURCE)
	};
}
