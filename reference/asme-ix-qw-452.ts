import { ASME_IX_QW_452_1B, ASME_IX_QW_452_3 } from './sources';
import type { Source } from './types';

/** QW-452.1(b): weld metal thickness qualified for a welder (groove tests). */
export const QW_452_1B = {
	/** Any coupon: 2t. */
	timesT: 2,
	/** t of 1/2 in (13 mm) and over with at least three layers: maximum to be welded. */
	unlimitedFrom: { in: 1 / 2, mm: 13 },
	minLayersForUnlimited: 3,
	source: ASME_IX_QW_452_1B as Source
} as const;

export interface Qw452_3Row {
	label: string;
	/** Coupon OD band; `lessThan` / `upTo` / `over` as printed. */
	in: { lessThan?: number; atLeast?: number; upTo?: number; over?: number };
	mm: { lessThan?: number; atLeast?: number; upTo?: number; over?: number };
	/** Minimum OD qualified; null means "size welded". Maximum is unlimited in every row. */
	minQualified: { in: number; mm: number } | null;
	source: Source;
}

export const QW_452_3: readonly Qw452_3Row[] = [
	{
		label: 'Less than 1 in (25 mm)',
		in: { lessThan: 1 },
		mm: { lessThan: 25 },
		minQualified: null,
		source: ASME_IX_QW_452_3
	},
	{
		label: '1 in (25 mm) to 2-7/8 in (73 mm)',
		in: { atLeast: 1, upTo: 2.875 },
		mm: { atLeast: 25, upTo: 73 },
		minQualified: { in: 1, mm: 25 },
		source: ASME_IX_QW_452_3
	},
	{
		label: 'Over 2-7/8 in (73 mm)',
		in: { over: 2.875 },
		mm: { over: 73 },
		minQualified: { in: 2.875, mm: 73 },
		source: ASME_IX_QW_452_3
	}
];
