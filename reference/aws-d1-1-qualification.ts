// AWS D1.1 WPS qualification ranges (2015 Tables 4.1 and 4.2, recalled; the pipe diameter rule
// read in Table 9.10): see the sources.
import { AWS_D1_1_QUALIFICATION, AWS_D1_1_TABLE_9_10 } from './sources';
import type { Source } from './types';

const S: Source = AWS_D1_1_QUALIFICATION;

/** CJP groove, plate: test thickness T (in) -> nominal thickness qualified. */
export const D1_1_THICKNESS: readonly {
	label: string;
	atLeastIn: number;
	lessThanIn: number;
	minIn: number;
	maxTimesT: number | null;
	source: Source;
}[] = [
	{
		label: '1/8 <= T <= 3/8 in',
		atLeastIn: 0.125,
		lessThanIn: 0.375 + 1e-6,
		minIn: 0.125,
		maxTimesT: 2,
		source: S
	},
	{
		label: '3/8 < T < 1 in',
		atLeastIn: 0.375 + 1e-6,
		lessThanIn: 1,
		minIn: 0.125,
		maxTimesT: 2,
		source: S
	},
	{
		label: 'T >= 1 in',
		atLeastIn: 1,
		lessThanIn: Infinity,
		minIn: 0.125,
		maxTimesT: null,
		source: S
	}
];

/** Pipe: job-size test under 24 in qualifies its diameter and over; 24 in and over, 24 in and over. */
export const D1_1_DIAMETER = { jobSizeBreakIn: 24, source: AWS_D1_1_TABLE_9_10 } as const;

/** WPS test position -> production positions qualified (groove). */
export const D1_1_WPS_POSITIONS: Readonly<Record<string, readonly ('F' | 'H' | 'V' | 'OH')[]>> = {
	'1G': ['F'],
	'2G': ['H'],
	'3G': ['V'],
	'4G': ['OH'],
	'5G': ['F', 'V', 'OH'],
	'6G': ['F', 'H', 'V', 'OH'],
	'6GR': ['F', 'H', 'V', 'OH'],
	'1F': ['F'],
	'2F': ['H'],
	'3F': ['V'],
	'4F': ['OH']
};
export const D1_1_POSITIONS_SOURCE: Source = S;
