import { AWS_D1_1_TABLE_3_3 } from './sources';
import type { Source } from './types';

export interface PreheatRow {
	label: string;
	/** Thickness of the thickest part at the point of welding; bands are (over, upTo]. */
	in: { atLeast?: number; over?: number; upTo?: number };
	mm: { atLeast?: number; over?: number; upTo?: number };
	minF: number;
	minC: number;
	source: Source;
}

const s = AWS_D1_1_TABLE_3_3;

/** Category B: SMAW with low-hydrogen electrodes, SAW, GMAW, FCAW. */
export const D1_1_CATEGORY_B: readonly PreheatRow[] = [
	{
		label: '1/8 to 3/4 in (3 to 20 mm) incl.',
		in: { atLeast: 1 / 8, upTo: 3 / 4 },
		mm: { atLeast: 3, upTo: 20 },
		minF: 32,
		minC: 0,
		source: s
	},
	{
		label: 'Over 3/4 thru 1-1/2 in (20 to 38 mm) incl.',
		in: { over: 3 / 4, upTo: 1.5 },
		mm: { over: 20, upTo: 38 },
		minF: 50,
		minC: 10,
		source: s
	},
	{
		label: 'Over 1-1/2 thru 2-1/2 in (38 to 65 mm) incl.',
		in: { over: 1.5, upTo: 2.5 },
		mm: { over: 38, upTo: 65 },
		minF: 150,
		minC: 65,
		source: s
	},
	{
		label: 'Over 2-1/2 in (65 mm)',
		in: { over: 2.5 },
		mm: { over: 65 },
		minF: 225,
		minC: 110,
		source: s
	}
];

/**
 * Table note: below 32 F (0 C) base metal temperature, preheat to at least 70 F (20 C) and keep
 * it during welding. Note a of D1.1:2015 Table 3.3 (Table 5.11 in D1.1:2025), as quoted by
 * public pages (clause5 cold-weather page on D1.1:2025; AWS forum thread 173640).
 */
export const D1_1_COLD_BASE_METAL = {
	belowF: 32,
	preheatF: 70,
	preheatC: 20,
	kind: 'published'
} as const;

/**
 * Steels the 2015 table lists under category B (first page of the table as read; the table goes
 * on with more grades). Spec keys are the normalised form used by base-metal.ts.
 */
export const D1_1_CATEGORY_B_SPECS: readonly string[] = [
	'A36',
	'A53-B',
	'A106-B',
	'A131',
	'A139-B',
	'A381-Y35',
	'A441',
	'A500-A',
	'A500-B',
	'A500-C',
	'A501',
	'A516-55',
	'A516-60',
	'A516-65',
	'A516-70',
	'A524',
	'A529-50',
	'A529-55',
	'A572-42',
	'A572-50',
	'A572-55',
	'A588',
	'A992'
];
