import { ASME_IX_QW_451_1 } from './sources';
import type { Source } from './types';

// A limit is either a fixed length (printed in both unit systems by the code) or a multiple of
// the coupon thickness T.
export type Limit = { fixed: { in: number; mm: number } } | { timesT: number };

export interface Qw451Row {
	/** Coupon thickness T band in each unit system, as the code prints it. */
	in: { over?: number; atLeast?: number; lessThan?: number; upTo?: number };
	mm: { over?: number; atLeast?: number; lessThan?: number; upTo?: number };
	label: string;
	min: Limit;
	max: Limit;
	/** Deposited weld metal: 2t, except that t >= 3/4 in (19 mm) takes `depositedWhenThick`. */
	depositedWhenThick?: Limit;
	source: Source;
}

const src = ASME_IX_QW_451_1;
const fixed = (inch: number, mm: number): Limit => ({ fixed: { in: inch, mm } });

export const QW_451_1: readonly Qw451Row[] = [
	{
		label: 'Less than 1/16 in (1.5 mm)',
		in: { lessThan: 1 / 16 },
		mm: { lessThan: 1.5 },
		min: { timesT: 1 },
		max: { timesT: 2 },
		source: src
	},
	{
		label: '1/16 to 3/8 in (1.5 to 10 mm), incl.',
		in: { atLeast: 1 / 16, upTo: 3 / 8 },
		mm: { atLeast: 1.5, upTo: 10 },
		min: fixed(1 / 16, 1.5),
		max: { timesT: 2 },
		source: src
	},
	{
		label: 'Over 3/8 in (10 mm), but less than 3/4 in (19 mm)',
		in: { over: 3 / 8, lessThan: 3 / 4 },
		mm: { over: 10, lessThan: 19 },
		min: fixed(3 / 16, 5),
		max: { timesT: 2 },
		source: src
	},
	{
		label: '3/4 in (19 mm) to less than 1-1/2 in (38 mm)',
		in: { atLeast: 3 / 4, lessThan: 1.5 },
		mm: { atLeast: 19, lessThan: 38 },
		min: fixed(3 / 16, 5),
		max: { timesT: 2 },
		depositedWhenThick: { timesT: 2 },
		source: src
	},
	{
		label: '1-1/2 in (38 mm) to 6 in (150 mm), incl.',
		in: { atLeast: 1.5, upTo: 6 },
		mm: { atLeast: 38, upTo: 150 },
		min: fixed(3 / 16, 5),
		max: fixed(8, 200),
		depositedWhenThick: fixed(8, 200),
		source: src
	},
	{
		label: 'Over 6 in (150 mm)',
		in: { over: 6 },
		mm: { over: 150 },
		min: fixed(3 / 16, 5),
		max: { timesT: 1.33 },
		depositedWhenThick: { timesT: 1.33 },
		source: src
	}
];

/** Deposited thickness t at or above which the thick-deposit column applies. */
export const QW_451_1_THICK_DEPOSIT = { in: 3 / 4, mm: 19 } as const;
