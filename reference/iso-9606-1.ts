// ISO 9606-1:2012 welder ranges of qualification (clause 5) as data, read from the text of the
// standard (see the source); the one reading the tables do not settle is marked from memory.
import { ISO_9606_1_2012 } from './sources';
import type { IsoPosition } from './iso-6947';
import type { Source } from './types';

const S: Source = ISO_9606_1_2012;

export const FILLER_GROUPS = ['FM1', 'FM2', 'FM3', 'FM4', 'FM5', 'FM6'] as const;
export type FillerGroup = (typeof FILLER_GROUPS)[number];

/** Table 2: filler material groups (the 3.75 % and 12 % Cr bounds' signs were not legible). */
export const FILLER_GROUP_NAMES: Readonly<Record<FillerGroup, string>> = {
	FM1: 'non-alloy and fine-grain steels',
	FM2: 'high-strength steels',
	FM3: 'creep-resisting steels, Cr up to 3.75 %',
	FM4: 'creep-resisting steels, Cr 3.75 % to 12 %',
	FM5: 'stainless and heat-resisting steels',
	FM6: 'nickel and nickel alloys'
};

/** Table 3: filler groups qualified by the group used in the test. */
export const FILLER_GROUP_QUALIFIES: Readonly<Record<FillerGroup, readonly FillerGroup[]>> = {
	FM1: ['FM1', 'FM2'],
	FM2: ['FM1', 'FM2'],
	FM3: ['FM1', 'FM2', 'FM3'],
	FM4: ['FM1', 'FM2', 'FM3', 'FM4'],
	FM5: ['FM5'],
	FM6: ['FM5', 'FM6']
};

/** 5.5.2: a test with any filler group also qualifies welding on ISO/TR 15608 groups 1 to 11. */
export const PARENT_GROUPS_QUALIFIED: readonly string[] = [
	'1',
	'2',
	'3',
	'4',
	'5',
	'6',
	'7',
	'8',
	'9',
	'10',
	'11'
];

/**
 * Table 6: butt welds, deposited thickness s (equal to the material thickness t for one process
 * and one filler type): s < 3: s to 3 or 2s, whichever is greater; 3 <= s < 12: 3 to 2s;
 * s >= 12 (at least 3 layers): 3 and over. Table 8: fillet welds, material thickness t:
 * t < 3: t to 2t or 3, whichever is greater; t >= 3: 3 and over.
 */
export const THICKNESS_BUTT = { thinBelow: 3, thickFrom: 12, minMm: 3, source: S };
export const THICKNESS_FILLET = { below: 3, maxAtLeastMm: 3, minAtOrOverMm: 3, source: S };

/** Table 7: outside pipe diameter D (mm): D <= 25: D to 2D; over: 0.5D, 25 mm min. */
export const DIAMETER = { smallUpTo: 25, minMm: 25, source: S };

/**
 * 5.3: plate covers fixed pipe of 500 mm OD and rotating pipe of 75 mm OD (PA, PB, PC, PD) and
 * up; pipe over 25 mm OD covers plate. (The comparison signs were not legible in the copy read.)
 */
export const PRODUCT = {
	plateToPipeOverMm: 500,
	plateRotatedToPipeOverMm: 75,
	pipeToPlateOverMm: 25,
	source: S
};

/**
 * Table 9 (butt) and Table 10 (fillet): positions qualified by a test position. The test position
 * itself is listed too; H-L045 and J-L045 also list the fixed-pipe position of their direction
 * (PH, PJ), a reading Table 9 has no column for (see ISO_9606_1_RANGES).
 */
export const POSITIONS_BUTT: Readonly<Partial<Record<IsoPosition, readonly IsoPosition[]>>> = {
	PA: ['PA'],
	PC: ['PA', 'PC'],
	PE: ['PA', 'PC', 'PE'],
	PF: ['PA', 'PF'],
	PH: ['PA', 'PE', 'PF', 'PH'],
	PG: ['PG'],
	PJ: ['PA', 'PE', 'PG', 'PJ'],
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
	PH: ['PA', 'PB', 'PC', 'PD', 'PE', 'PF', 'PH'],
	PG: ['PG'],
	PJ: ['PA', 'PB', 'PD', 'PE', 'PG', 'PJ']
};
export const POSITIONS_SOURCE: Source = S;

/**
 * 5.2: processes a test covers besides its own (ISO 4063 numbers): 135 and 138 cover each other,
 * so do 121 and 125; 141, 143 and 145 each qualify 141, 142, 143 and 145; 142 qualifies only 142.
 * (A short-circuit test with 131, 135 or 138 also qualifies the other transfer modes, not the
 * reverse; welder transfer mode is not modelled.)
 */
export const PROCESS_ALSO: Readonly<Record<string, readonly string[]>> = {
	'135': ['138'],
	'138': ['135'],
	'121': ['125'],
	'125': ['121'],
	'141': ['142', '143', '145'],
	'143': ['141', '142', '145'],
	'145': ['141', '142', '143']
};
