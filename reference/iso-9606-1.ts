// ISO 9606-1:2012 welder ranges of qualification (clause 5) as data. Rows recalled: see source.
import { ISO_9606_1_RANGES } from './sources';
import type { IsoPosition } from './iso-6947';
import type { Source } from './types';

const S: Source = ISO_9606_1_RANGES;

export const FILLER_GROUPS = ['FM1', 'FM2', 'FM3', 'FM4', 'FM5', 'FM6'] as const;
export type FillerGroup = (typeof FILLER_GROUPS)[number];

/** Table 1: filler material groups. */
export const FILLER_GROUP_NAMES: Readonly<Record<FillerGroup, string>> = {
	FM1: 'non-alloy and fine-grain steels',
	FM2: 'high-strength steels',
	FM3: 'creep-resisting steels, Cr < 3.75 %',
	FM4: 'creep-resisting steels, 3.75 % <= Cr <= 12 %',
	FM5: 'stainless and heat-resisting steels',
	FM6: 'nickel and nickel alloys'
};

/** Table 4: filler groups qualified by the group used in the test. */
export const FILLER_GROUP_QUALIFIES: Readonly<Record<FillerGroup, readonly FillerGroup[]>> = {
	FM1: ['FM1', 'FM2'],
	FM2: ['FM1', 'FM2'],
	FM3: ['FM1', 'FM2', 'FM3'],
	FM4: ['FM1', 'FM2', 'FM3', 'FM4'],
	FM5: ['FM5'],
	FM6: ['FM5', 'FM6']
};

/** Table 2: ISO/TR 15608 parent material groups usually welded with each filler group. */
export const FILLER_GROUP_PARENT: Readonly<Record<FillerGroup, readonly string[]>> = {
	FM1: ['1.1', '1.2', '1.4', '11'],
	FM2: ['1.3', '2', '3'],
	FM3: ['4', '5.1', '5.2', '6'],
	FM4: ['5.3', '5.4', '6'],
	FM5: ['7', '8', '9', '10'],
	FM6: ['8.2', '41', '42', '43', '44', '45', '46', '47', '48']
};

/** Table 9: butt welds, material thickness t (mm). Table 10: fillet welds. */
export const THICKNESS_BUTT = { thinBelow: 3, midUpTo: 12, thickMinMm: 5, midMinMm: 3, source: S };
export const THICKNESS_FILLET = { below: 3, maxBelowMm: 3, minAtOrOverMm: 3, source: S };

/** Table 11: outside pipe diameter D (mm). */
export const DIAMETER = { smallUpTo: 25, minMm: 25, source: S };

/** Product type (5.3): plate qualifies pipe over 500 mm OD (75 mm rotated PA/PC); pipe over 25 mm qualifies plate. */
export const PRODUCT = {
	plateToPipeOverMm: 500,
	plateRotatedToPipeOverMm: 75,
	pipeToPlateOverMm: 25,
	source: S
};

/** Table 12 (butt) and Table 13 (fillet): positions qualified by a test position. */
export const POSITIONS_BUTT: Readonly<Partial<Record<IsoPosition, readonly IsoPosition[]>>> = {
	PA: ['PA'],
	PC: ['PA', 'PC'],
	PE: ['PA', 'PC', 'PE'],
	PF: ['PA', 'PF'],
	PH: ['PA', 'PE', 'PF', 'PH'],
	PG: ['PG'],
	PJ: ['PG', 'PJ'],
	'H-L045': ['PA', 'PC', 'PE', 'PF', 'PH', 'H-L045'],
	'J-L045': ['PA', 'PC', 'PE', 'PG', 'PJ', 'J-L045']
};
export const POSITIONS_FILLET: Readonly<Partial<Record<IsoPosition, readonly IsoPosition[]>>> = {
	PA: ['PA'],
	PB: ['PA', 'PB'],
	PC: ['PA', 'PB', 'PC'],
	PD: ['PA', 'PB', 'PC', 'PD', 'PE'],
	PE: ['PA', 'PB', 'PC', 'PD', 'PE'],
	PF: ['PA', 'PB', 'PF'],
	PH: ['PA', 'PB', 'PD', 'PE', 'PF', 'PH'],
	PG: ['PG'],
	PJ: ['PG', 'PJ']
};
export const POSITIONS_SOURCE: Source = S;

/**
 * 5.2: processes a test covers besides its own (ISO 4063 numbers). As recalled: 135 (solid wire)
 * and 138 (metal-cored) cover each other; every other process covers itself only.
 */
export const PROCESS_ALSO: Readonly<Record<string, readonly string[]>> = {
	'135': ['138'],
	'138': ['135']
};
