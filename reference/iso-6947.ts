// ISO 6947 welding positions and the usual ASME / AWS test position each corresponds to.
import { ISO_6947, ISO_6947_RECALLED } from './sources';
import type { Source } from './types';

export const ISO_POSITIONS = [
	'PA',
	'PB',
	'PC',
	'PD',
	'PE',
	'PF',
	'PG',
	'PH',
	'PJ',
	'H-L045',
	'J-L045'
] as const;
export type IsoPosition = (typeof ISO_POSITIONS)[number];

export const ISO_POSITION_NAMES: Readonly<Record<IsoPosition, string>> = {
	PA: 'flat',
	PB: 'horizontal-vertical (fillet)',
	PC: 'horizontal',
	PD: 'horizontal-overhead (fillet)',
	PE: 'overhead',
	PF: 'vertical up',
	PG: 'vertical down',
	PH: 'pipe fixed, vertical up',
	PJ: 'pipe fixed, vertical down',
	'H-L045': 'pipe inclined 45 degrees, welding up',
	'J-L045': 'pipe inclined 45 degrees, welding down'
};

/** ASME / AWS test position -> ISO 6947 position (ISO 6947:2011 Annex B, Table B.1). */
export const ASME_TO_ISO: Readonly<Record<string, readonly IsoPosition[]>> = {
	'1G': ['PA'],
	'2G': ['PC'],
	'3G': ['PF', 'PG'],
	'4G': ['PE'],
	'5G': ['PH', 'PJ'],
	'6G': ['H-L045', 'J-L045'],
	'6GR': ['H-L045'],
	'1F': ['PA'],
	'2F': ['PB'],
	'2FR': ['PB'],
	'3F': ['PF', 'PG'],
	'4F': ['PD'],
	'5F': ['PH', 'PJ']
};

export const ISO_6947_SOURCE: Source = ISO_6947;

/** Rows of ASME_TO_ISO whose equivalent was recalled, not read; every other row is ISO_6947. */
const RECALLED = new Set(['2FR', '5F']);
/** The source of one ASME_TO_ISO row. */
export const asmeToIsoSource = (asme: string): Source =>
	RECALLED.has(asme) ? ISO_6947_RECALLED : ISO_6947;
