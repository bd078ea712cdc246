import {
	GAS_FLOW_FCAW_TEXTBOOK,
	GAS_FLOW_MEMORY,
	GAS_FLOW_PRACTICE,
	GAS_MIX_PRACTICE
} from './sources';
import type { Band, Process, Source } from './types';

export interface GasMix {
	id: string;
	name: string;
	/** Lower-case spellings people type; matched after removing spaces and '%'. */
	aliases: readonly string[];
	/** Volume percent. */
	ar: number;
	he: number;
	co2: number;
	o2: number;
	use: string;
	source: Source;
}

const mix = (
	id: string,
	name: string,
	aliases: readonly string[],
	[ar, he, co2, o2]: readonly [number, number, number, number],
	use: string
): GasMix => ({ id, name, aliases, ar, he, co2, o2, use, source: GAS_MIX_PRACTICE });

export const GAS_MIXES: readonly GasMix[] = [
	mix(
		'argon',
		'Argon',
		['argon', 'ar', '100ar', 'pureargon', 'sg-a'],
		[100, 0, 0, 0],
		'GTAW on everything; GMAW on aluminium'
	),
	mix(
		'helium',
		'Helium',
		['helium', 'he', '100he', 'sg-he'],
		[0, 100, 0, 0],
		'GTAW DCEN on thick aluminium and copper'
	),
	mix(
		'ar-he-75-25',
		'75 % argon / 25 % helium',
		['75/25ar/he', 'ar/he75/25', '75ar/25he', 'a-25'],
		[75, 25, 0, 0],
		'hotter GTAW or GMAW on aluminium'
	),
	mix(
		'ar-he-25-75',
		'25 % argon / 75 % helium',
		['25/75ar/he', 'ar/he25/75', '25ar/75he', '75he/25ar', 'a-75'],
		[25, 75, 0, 0],
		'thick aluminium and copper'
	),
	mix(
		'ar-co2-75-25',
		'75 % argon / 25 % CO2',
		['75/25', 'c25', '75/25ar/co2', 'ar/co275/25', '75ar/25co2'],
		[75, 0, 25, 0],
		'GMAW short-circuit on carbon steel'
	),
	mix(
		'ar-co2-80-20',
		'80 % argon / 20 % CO2',
		['80/20', 'c20', '80/20ar/co2', 'ar/co280/20', '80ar/20co2'],
		[80, 0, 20, 0],
		'GMAW on carbon steel; gas-shielded FCAW marked M'
	),
	mix(
		'ar-co2-90-10',
		'90 % argon / 10 % CO2',
		['90/10', 'c10', '90/10ar/co2', 'ar/co290/10', '90ar/10co2'],
		[90, 0, 10, 0],
		'GMAW short-circuit and spray on carbon steel'
	),
	mix(
		'ar-co2-98-2',
		'98 % argon / 2 % CO2',
		['98/2ar/co2', 'ar/co298/2', '98ar/2co2', 'c2'],
		[98, 0, 2, 0],
		'GMAW spray and pulsed on stainless'
	),
	mix(
		'ar-o2-98-2',
		'98 % argon / 2 % oxygen',
		['98/2', '98/2ar/o2', 'ar/o298/2', '98ar/2o2', 's2'],
		[98, 0, 0, 2],
		'GMAW spray on stainless and carbon steel'
	),
	mix(
		'ar-o2-95-5',
		'95 % argon / 5 % oxygen',
		['95/5ar/o2', 'ar/o295/5', '95ar/5o2', 's5'],
		[95, 0, 0, 5],
		'GMAW spray on carbon steel'
	),
	mix(
		'co2',
		'100 % CO2',
		['co2', '100co2', 'c100', 'carbondioxide'],
		[0, 0, 100, 0],
		'GMAW short-circuit on carbon steel; gas-shielded FCAW marked C'
	),
	mix(
		'tri-mix',
		'Tri-mix 90 % He / 7.5 % Ar / 2.5 % CO2',
		['tri-mix', 'trimix', '90/7.5/2.5', 'he/ar/co290/7.5/2.5'],
		[7.5, 90, 2.5, 0],
		'GMAW short-circuit on stainless'
	)
];

export type GasUse = 'GTAW' | 'GTAW-helium' | 'GMAW' | 'GMAW-helium' | 'FCAW';

export interface FlowRow {
	use: GasUse;
	cfh: Band;
	note: string;
	source: Source;
}

export const GAS_FLOW: readonly FlowRow[] = [
	{
		use: 'GTAW',
		cfh: { min: 11, max: 35 },
		note: 'argon or argon-rich',
		source: GAS_FLOW_PRACTICE
	},
	{
		use: 'GMAW',
		cfh: { min: 25, max: 35 },
		note: 'thin to 3/8 in; out of position often needs more',
		source: GAS_FLOW_PRACTICE
	},
	{
		use: 'GTAW-helium',
		cfh: { min: 25, max: 60 },
		note: 'helium is light and needs roughly twice the flow of argon',
		source: GAS_FLOW_MEMORY
	},
	{
		use: 'GMAW-helium',
		cfh: { min: 35, max: 70 },
		note: 'helium-rich mixes',
		source: GAS_FLOW_MEMORY
	},
	{
		use: 'FCAW',
		cfh: { min: 25, max: 50 },
		note: 'gas-shielded flux-cored wire, 1/16 to 3/4 in carbon steel; out of position often needs more',
		source: GAS_FLOW_FCAW_TEXTBOOK
	}
];

/** Minimum argon share for true spray transfer (common practice). */
export const SPRAY_MIN_ARGON = 80;

export const gasUseFor = (process: Process, heliumRich: boolean): GasUse | null =>
	process === 'GTAW'
		? heliumRich
			? 'GTAW-helium'
			: 'GTAW'
		: process === 'GMAW'
			? heliumRich
				? 'GMAW-helium'
				: 'GMAW'
			: process === 'FCAW'
				? 'FCAW'
				: null;
