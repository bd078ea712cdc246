// ISO 15614-1 ranges of qualification (clause 8) as data. Rows recalled: see the source.
import { ISO_15614_1_RANGES, ISO_TR_15608 } from './sources';
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

const S = ISO_15614_1_RANGES;

/** Butt welds, parent material thickness (2004 Table 5; 2017 Table 6, level 2 column). */
export const ISO_15614_1_THICKNESS: readonly IsoThicknessRow[] = [
	{
		over: 0,
		upTo: 3,
		singleRun: { min: { timesT: 0.7 }, max: { timesT: 1.3 } },
		multiRun: { min: { timesT: 0.7 }, max: { timesT: 2 } },
		source: S
	},
	{
		over: 3,
		upTo: 12,
		singleRun: { min: { timesT: 0.5, atLeastMm: 3 }, max: { timesT: 1.3 } },
		multiRun: { min: { fixedMm: 3 }, max: { timesT: 2 } },
		source: S
	},
	{
		over: 12,
		upTo: 100,
		singleRun: { min: { timesT: 0.5 }, max: { timesT: 1.1 } },
		multiRun: { min: { timesT: 0.5 }, max: { timesT: 2 } },
		source: S
	},
	{
		over: 100,
		upTo: Infinity,
		singleRun: null,
		multiRun: { min: { fixedMm: 50 }, max: { timesT: 2 } },
		source: S
	}
];

/** Pipe outside diameter D (2004 Table 6; 2017 Table 7): D <= 25 mm: 0.5D-2D; over: 0.5D, 25 mm min. */
export const ISO_15614_1_DIAMETER = {
	smallUpToMm: 25,
	small: { minTimesD: 0.5, maxTimesD: 2 },
	large: { minTimesD: 0.5, minMm: 25 },
	/** A plate test also qualifies pipe over 500 mm OD (over 150 mm when welded PA or PC rotated). */
	plateQualifiesPipeOverMm: 500,
	plateRotatedQualifiesPipeOverMm: 150,
	source: S
} as const;

/** Heat input: +25 % on the upper limit with impact requirements, -25 % on the lower with hardness. */
export const ISO_15614_1_HEAT_INPUT = { upperFactor: 1.25, lowerFactor: 0.75, source: S } as const;

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
 * Subgroups qualified by a test piece of a subgroup (ISO 15614-1 8.3.1.1, as recalled): in group 1
 * a higher-strength subgroup qualifies the lower ones (1.3 -> 1.1, 1.2, 1.3); every other subgroup
 * qualifies itself only. Dissimilar joints (two groups) are not modelled.
 */
export const ISO_15614_1_MATERIAL: Readonly<Record<string, readonly string[]>> = {
	'1.1': ['1.1'],
	'1.2': ['1.1', '1.2'],
	'1.3': ['1.1', '1.2', '1.3'],
	'1.4': ['1.4']
};
