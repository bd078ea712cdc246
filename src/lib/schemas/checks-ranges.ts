// The checks API's qualification answers: the PQR thickness range qualified (QW-451.1) and the
// welder positions qualified (QW-461.9), in the units the request used.
import { z } from 'zod';
import { pqrThicknessRange, welderPositions } from '$lib/weld/qualified-ranges';
import type { FindingSource } from '$lib/weld/findings';
import { length, list, POSITIONS, PROCESSES, TRANSFERS } from './checks-quantities';

// ---- /api/v1/checks/pqr-ranges ----

const couponLength = length(2540, 'Keep it at or under 100 in (2540 mm).');

// The contract's body carries both T and t, and its answer always carries depositedMax (a
// quantity, never null); QW-451.1 reads that maximum from t, so t is required.
export const pqrRangesBodySchema = z.object({
	process: z.enum(PROCESSES, { error: `Process is one of ${list(PROCESSES)}.` }),
	couponThickness: couponLength,
	depositedThickness: couponLength,
	/** Optional: short-circuit GMAW takes the QW-403.10 limit. */
	transfer: z.enum(TRANSFERS, { error: `Transfer is one of ${list(TRANSFERS)}.` }).optional()
});
export type PqrRangesBody = z.output<typeof pqrRangesBodySchema>;

interface Qty {
	value: number;
	unit: 'in' | 'mm';
}

export type PqrRangesAnswer =
	| {
			ok: true;
			answer: {
				baseMetal: { min: Qty; max: Qty };
				depositedMax: Qty;
				row: string;
				notes: string[];
				source: FindingSource;
			};
	  }
	| { ok: false; errors: Record<string, string[]> };

/** The pqr-ranges answer (QW-451.1), in the units the request used. */
export function pqrRangesAnswer(body: PqrRangesBody): PqrRangesAnswer {
	const transfer = body.process === 'GMAW' ? body.transfer : undefined;
	const r = pqrThicknessRange(body.couponThickness, body.depositedThickness, transfer);
	if (!r.ok) return { ok: false, errors: { couponThickness: [r.message] } };
	if (!r.depositedMax)
		return {
			ok: false,
			errors: { depositedThickness: ['Give the deposited weld metal thickness t.'] }
		};
	return {
		ok: true,
		answer: {
			baseMetal: r.baseMetal,
			depositedMax: r.depositedMax,
			row: r.row,
			notes: r.notes,
			source: r.source
		}
	};
}

// ---- /api/v1/checks/welder-positions ----

export const welderPositionsBodySchema = z.object({
	testPositions: z
		.array(
			z.preprocess(
				(v) => (typeof v === 'string' ? v.trim().toUpperCase() : v),
				z.enum(POSITIONS, { error: `Test position is one of ${list(POSITIONS)}.` })
			),
			{ error: 'Give the test positions as a list, e.g. ["3G"].' }
		)
		.min(1, 'Give at least one test position.')
		.max(10, 'Give at most 10 test positions.')
});
export type WelderPositionsBody = z.output<typeof welderPositionsBodySchema>;

export type WelderPositionsAnswer =
	| {
			ok: true;
			answer: {
				groove: string[];
				fillet: string[];
				groovePipe: string[];
				notes: string[];
				source: FindingSource;
			};
	  }
	| { ok: false; errors: Record<string, string[]> };

/**
 * The welder-positions answer (QW-461.9). `groove` is plate and pipe over 24 in (610 mm) OD;
 * `groovePipe` adds what the table allows on pipe 24 in OD and under.
 */
export function welderPositionsAnswer(body: WelderPositionsBody): WelderPositionsAnswer {
	if (body.testPositions.includes('6GR'))
		return {
			ok: false,
			errors: {
				testPositions: [
					'6GR is an AWS D1.1 test for T-, K- and Y-connections; ASME QW-461.9 has no row for it.'
				]
			}
		};
	const r = welderPositions(body.testPositions);
	return {
		ok: true,
		answer: {
			groove: r.groove,
			fillet: r.fillet,
			groovePipe: r.groovePipe,
			notes: [
				'groove: plate, and pipe over 24 in (610 mm) OD. groovePipe: pipe 24 in OD and under; from plate tests only 2-7/8 in (73 mm) OD and over. Diameter limits: QW-452.3.'
			],
			source: r.source
		}
	};
}
