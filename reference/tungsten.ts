import { AWS_A5_12, TUNGSTEN_CHART_A, TUNGSTEN_CHART_B } from './sources';
import type { Band, Source } from './types';

export type TungstenClass =
	'EWP' | 'EWCe-2' | 'EWLa-1' | 'EWLa-1.5' | 'EWLa-2' | 'EWTh-1' | 'EWTh-2' | 'EWZr-1' | 'EWG';

export type TungstenGroup = 'pure' | 'oxide' | 'zirconiated' | 'other';

export interface TungstenClassRow {
	classification: TungstenClass;
	oxide: string;
	/** Colour band; A5.12 moved EWCe-2 from orange to grey, both are seen. */
	colour: string;
	group: TungstenGroup;
	/** ISO 6848 names that mean the same electrode. */
	iso6848: readonly string[];
	radioactive: boolean;
	source: Source;
}

export const TUNGSTEN_CLASSES: readonly TungstenClassRow[] = [
	{
		classification: 'EWP',
		oxide: 'none (99.5 % W)',
		colour: 'green',
		group: 'pure',
		iso6848: ['WP'],
		radioactive: false,
		source: AWS_A5_12
	},
	{
		classification: 'EWCe-2',
		oxide: '2 % ceria',
		colour: 'grey (formerly orange)',
		group: 'oxide',
		iso6848: ['WC20'],
		radioactive: false,
		source: AWS_A5_12
	},
	{
		classification: 'EWLa-1',
		oxide: '1 % lanthana',
		colour: 'black',
		group: 'oxide',
		iso6848: ['WL10'],
		radioactive: false,
		source: AWS_A5_12
	},
	{
		classification: 'EWLa-1.5',
		oxide: '1.5 % lanthana',
		colour: 'gold',
		group: 'oxide',
		iso6848: ['WL15'],
		radioactive: false,
		source: AWS_A5_12
	},
	{
		classification: 'EWLa-2',
		oxide: '2 % lanthana',
		colour: 'blue',
		group: 'oxide',
		iso6848: ['WL20'],
		radioactive: false,
		source: AWS_A5_12
	},
	{
		classification: 'EWTh-1',
		oxide: '1 % thoria',
		colour: 'yellow',
		group: 'oxide',
		iso6848: ['WT10'],
		radioactive: true,
		source: AWS_A5_12
	},
	{
		classification: 'EWTh-2',
		oxide: '2 % thoria',
		colour: 'red',
		group: 'oxide',
		iso6848: ['WT20'],
		radioactive: true,
		source: AWS_A5_12
	},
	{
		classification: 'EWZr-1',
		oxide: '0.15-0.40 % zirconia',
		colour: 'brown',
		group: 'zirconiated',
		iso6848: ['WZ3'],
		radioactive: false,
		source: AWS_A5_12
	},
	{
		classification: 'EWG',
		oxide: 'not specified (maker states it)',
		colour: 'grey',
		group: 'other',
		iso6848: [],
		radioactive: false,
		source: AWS_A5_12
	}
];

export type TungstenCurrent = 'DCEN' | 'AC';

export interface TungstenAmpRow {
	/** Nominal diameter in inches; the mm size sold alongside is within 0.05 mm. */
	diameterIn: number;
	diameterMm: number;
	group: TungstenGroup;
	current: TungstenCurrent;
	amps: Band;
}

export interface TungstenAmpTable {
	id: 'chart-a' | 'chart-b';
	source: Source;
	gas: string;
	rows: readonly TungstenAmpRow[];
}

const sizes = [
	[0.04, 1.0],
	[1 / 16, 1.6],
	[3 / 32, 2.4],
	[1 / 8, 3.2]
] as const;

const rows = (
	group: TungstenGroup,
	current: TungstenCurrent,
	bands: readonly (readonly [number, number])[]
): TungstenAmpRow[] =>
	bands.map(([min, max], i) => {
		const size = sizes[i] ?? sizes[0];
		return { diameterIn: size[0], diameterMm: size[1], group, current, amps: { min, max } };
	});

// Charts disagree (chart B gives 3/32 in DCEN 150-250 A where chart A gives 135-235 A), so each
// is kept whole and the check reports against both.
export const TUNGSTEN_AMPS: readonly TungstenAmpTable[] = [
	{
		id: 'chart-a',
		source: TUNGSTEN_CHART_A,
		gas: 'argon',
		rows: [
			...rows('oxide', 'DCEN', [
				[25, 85],
				[50, 160],
				[135, 235],
				[250, 400]
			]),
			...rows('oxide', 'AC', [
				[20, 80],
				[50, 150],
				[130, 250],
				[225, 360]
			]),
			...rows('zirconiated', 'AC', [
				[20, 80],
				[50, 150],
				[130, 250],
				[225, 360]
			]),
			...rows('pure', 'AC', [
				[10, 60],
				[50, 100],
				[100, 160],
				[150, 210]
			])
		]
	},
	{
		id: 'chart-b',
		source: TUNGSTEN_CHART_B,
		gas: 'argon',
		rows: [
			...rows('oxide', 'DCEN', [
				[15, 80],
				[70, 150],
				[150, 250],
				[250, 400]
			]),
			...rows('zirconiated', 'AC', [
				[15, 80],
				[70, 150],
				[140, 235],
				[225, 325]
			])
		]
	}
];
