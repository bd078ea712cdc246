// ISO 15614-1 ranges of qualification (clause 8) as data, read from the 2017 and 2017+A1:2019
// texts (see the source); what they do not settle is recalled and marked so.
import { ISO_15614_1_2017, ISO_TR_15608 } from './sources';
import type { Source } from './types';

/** A limit in mm: a multiple of the test thickness, a fixed length, or the larger of both. */
export type IsoLimit = { timesT: number; atLeastMm?: number } | { fixedMm: number } | null;

export interface IsoThicknessRow {
	/** The test piece thickness t this row covers, mm: over `over`, up to and including `upTo`. */
	over: number;
	upTo: number;
	singleRun: { min: IsoLimit; max: IsoLimit } | null;
	multiRun: { min: IsoLimit; max: IsoLimit };
	source: Source;
}

const P = ISO_15614_1_2017;

/**
 * Butt welds, parent material thickness (2017 Table 7, level 2 columns). The t <= 3 mm row prints
 * one cell, 0.5t to 2t, across the level columns (2004 had 0.7t to 1.3t single run, 0.7t to 2t
 * multi-run); 2017 gives no single-run row over 40 mm (2004 did, to 100 mm).
 */
export const ISO_15614_1_THICKNESS: readonly IsoThicknessRow[] = [
	{
		over: 0,
		upTo: 3,
		singleRun: { min: { timesT: 0.5 }, max: { timesT: 2 } },
		multiRun: { min: { timesT: 0.5 }, max: { timesT: 2 } },
		source: P
	},
	{
		over: 3,
		upTo: 12,
		singleRun: { min: { timesT: 0.5, atLeastMm: 3 }, max: { timesT: 1.3 } },
		multiRun: { min: { fixedMm: 3 }, max: { timesT: 2 } },
		source: P
	},
	{
		over: 12,
		upTo: 40,
		singleRun: { min: { timesT: 0.5 }, max: { timesT: 1.1 } },
		multiRun: { min: { timesT: 0.5 }, max: { timesT: 2 } },
		source: P
	},
	{
		over: 40,
		upTo: 100,
		singleRun: null,
		multiRun: { min: { timesT: 0.5 }, max: { timesT: 2 } },
		source: P
	},
	{
		over: 100,
		upTo: Infinity,
		singleRun: null,
		multiRun: { min: { fixedMm: 50 }, max: { timesT: 2 } },
		source: P
	}
];

/**
 * Pipe outside diameter D (2017 8.3.3, Table 9, level 2): D qualifies 0.5D and over. (The 2004
 * Table 6 capped D <= 25 mm at 2D and set a 25 mm floor; 2017 has neither.)
 */
export const ISO_15614_1_DIAMETER = {
	minTimesD: 0.5,
	/** A plate test also qualifies pipe over 500 mm OD (over 150 mm welded in PC, or PA/PF rotated). */
	plateQualifiesPipeOverMm: 500,
	plateRotatedQualifiesPipeOverMm: 150,
	source: P
} as const;

/** Heat input (8.4.7, level 2): +25 % on the upper limit with impact, -25 % on the lower with hardness. */
export const ISO_15614_1_HEAT_INPUT = { upperFactor: 1.25, lowerFactor: 0.75, source: P } as const;

/** Preheat (8.4.8) may drop, and interpass (8.4.9) rise, by this much before requalification. */
export const ISO_15614_1_TEMPERATURE = {
	preheatDropC: 50,
	interpassRiseC: 50,
	/** Level 2: for these ISO/TR 15608 groups the interpass limit is the highest reached in the test. */
	interpassAsTestedGroups: ['8', '10', '41', '42', '43', '44', '45', '46', '47', '48'],
	source: P
} as const;

/** ISO/TR 15608 steel groups (group names as recalled; subgroups 1.1-1.4 by yield strength). */
export const ISO_TR_15608_GROUPS: Readonly<Record<string, string>> = {
	'1': 'Steels with ReH up to 460 MPa (C 0.25 % max and limits on other elements)',
	'1.1': 'Group 1, ReH up to 275 MPa',
	'1.2': 'Group 1, ReH over 275 to 360 MPa',
	'1.3': 'Group 1, normalised fine-grain steels, ReH over 360 MPa',
	'1.4': 'Group 1, steels with improved atmospheric corrosion resistance',
	'2': 'Thermomechanically treated fine-grain steels and cast steels, ReH over 360 MPa',
	'3': 'Quenched and tempered and precipitation-hardened steels, ReH over 360 MPa',
	'4': 'Low-vanadium Cr-Mo-(Ni) steels, Mo 0.7 % max, V 0.1 % max',
	'5': 'Cr-Mo steels free of vanadium, C 0.35 % max',
	'6': 'High-vanadium Cr-Mo-(Ni) alloyed steels',
	'7': 'Ferritic, martensitic or precipitation-hardened stainless steels',
	'8': 'Austenitic stainless steels, Ni 35 % max',
	'9': 'Nickel-alloyed steels, Ni 10 % max',
	'10': 'Austenitic-ferritic (duplex) stainless steels',
	'11': 'Steels as group 1 but C over 0.25 to 0.85 %'
};
export const ISO_TR_15608_SOURCE: Source = ISO_TR_15608;

/**
 * Subgroups qualified by a test piece of a subgroup (ISO 15614-1:2017 8.3.1.2, Table 5 note a:
 * groups 1, 2, 3 and 11 qualify the equal or lower specified minimum yield strength steels), so in
 * group 1 a higher-strength subgroup qualifies the lower ones (1.3 -> 1.1, 1.2, 1.3). Sub-group 1.4
 * (weather-resistant steels) qualifying itself only is recalled. Every other subgroup qualifies
 * itself only here (Table 5 note b would also give lower sub-groups of groups 4, 5, 6, 8 and 9; not
 * modelled, so Beadline is the stricter). Dissimilar joints (two groups) are not modelled.
 */
export const ISO_15614_1_MATERIAL: Readonly<Record<string, readonly string[]>> = {
	'1.1': ['1.1'],
	'1.2': ['1.1', '1.2'],
	'1.3': ['1.1', '1.2', '1.3'],
	'1.4': ['1.4']
};
