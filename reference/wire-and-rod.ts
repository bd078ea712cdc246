import {
	GMAW_THICKNESS_BANDS,
	GTAW_ROD_CHART,
	SMAW_ELECTRODE_CHART,
	THICKNESS_RULE,
	WFS_PER_AMP,
	WIRE_CHART_BRIEF
} from './sources';
import type { Band, Source } from './types';

export interface WireAmpRow {
	diameterIn: number;
	/** Short-circuit band. */
	shortCircuit: Band;
	/** Spray band; null where the chart gives none. */
	spray: Band | null;
	source: Source;
}

/** GMAW solid carbon steel wire. */
export const GMAW_WIRE_AMPS: readonly WireAmpRow[] = [
	{ diameterIn: 0.024, shortCircuit: { min: 30, max: 90 }, spray: null, source: WFS_PER_AMP },
	{
		diameterIn: 0.03,
		shortCircuit: { min: 70, max: 130 },
		spray: { min: 150, max: 265 },
		source: WIRE_CHART_BRIEF
	},
	{
		diameterIn: 0.035,
		shortCircuit: { min: 80, max: 190 },
		spray: { min: 175, max: 290 },
		source: WIRE_CHART_BRIEF
	},
	{
		diameterIn: 0.045,
		shortCircuit: { min: 100, max: 225 },
		spray: { min: 200, max: 315 },
		source: WIRE_CHART_BRIEF
	}
];

export interface WfsRow {
	/** Diameters this row covers (0.023 and 0.024 in are sold as the same size class). */
	diameterIn: readonly number[];
	/** Inches of wire per minute per amp. */
	inPerMinPerAmp: number;
	source: Source;
}

export const WFS_PER_AMP_TABLE: readonly WfsRow[] = [
	{ diameterIn: [0.023, 0.024], inPerMinPerAmp: 3.5, source: WFS_PER_AMP },
	{ diameterIn: [0.03], inPerMinPerAmp: 2.0, source: WFS_PER_AMP },
	{ diameterIn: [0.035], inPerMinPerAmp: 1.6, source: WFS_PER_AMP },
	{ diameterIn: [0.045], inPerMinPerAmp: 1.0, source: WFS_PER_AMP }
];

/** How far actual amps may sit from WFS / (in/min per A) before it is worth a look. */
export const WFS_TOLERANCE = 0.2;

export interface RodAmpRow {
	diameterIn: number;
	amps: Band;
	source: Source;
}

export const GTAW_ROD_AMPS: readonly RodAmpRow[] = [
	{ diameterIn: 1 / 16, amps: { min: 20, max: 90 }, source: GTAW_ROD_CHART },
	{ diameterIn: 3 / 32, amps: { min: 65, max: 115 }, source: GTAW_ROD_CHART },
	{ diameterIn: 1 / 8, amps: { min: 100, max: 165 }, source: GTAW_ROD_CHART }
];

/** E7018-type low-hydrogen electrodes: the E7018 column of Machinery's Handbook Table 14. */
export const SMAW_ELECTRODE_AMPS: readonly RodAmpRow[] = [
	{ diameterIn: 3 / 32, amps: { min: 70, max: 105 }, source: SMAW_ELECTRODE_CHART },
	{ diameterIn: 1 / 8, amps: { min: 110, max: 160 }, source: SMAW_ELECTRODE_CHART },
	{ diameterIn: 5 / 32, amps: { min: 150, max: 215 }, source: SMAW_ELECTRODE_CHART },
	{ diameterIn: 3 / 16, amps: { min: 180, max: 275 }, source: SMAW_ELECTRODE_CHART }
];

/** GTAW amps per inch of thickness, by base metal family, and the band around it. */
export const GTAW_THICKNESS_RULE = {
	ampsPerInch: 1000,
	band: 0.25,
	factor: { 'carbon-steel': 1.0, 'low-alloy': 1.0, stainless: 0.9, aluminium: 1.25 },
	/** Above this the rule stops meaning much: thicker joints are multi-pass. */
	maxThicknessIn: 1 / 4,
	source: THICKNESS_RULE
} as const;

export interface GmawThicknessRow {
	/** Band upper edge, inclusive. */
	upToIn: number;
	label: string;
	amps: Band;
}

/** GMAW carbon steel, any transfer; stainless takes the same 0.9 factor as GTAW. */
export const GMAW_THICKNESS_TABLE = {
	source: GMAW_THICKNESS_BANDS,
	stainlessFactor: 0.9,
	rows: [
		{ upToIn: 0.025, label: '24 ga and thinner', amps: { min: 30, max: 60 } },
		{ upToIn: 0.036, label: '22-20 ga', amps: { min: 40, max: 80 } },
		{ upToIn: 0.048, label: '18 ga', amps: { min: 60, max: 100 } },
		{ upToIn: 0.06, label: '16 ga', amps: { min: 70, max: 120 } },
		{ upToIn: 0.075, label: '14 ga', amps: { min: 80, max: 140 } },
		{ upToIn: 0.105, label: '12 ga', amps: { min: 100, max: 160 } },
		{ upToIn: 0.135, label: '10 ga to 1/8 in', amps: { min: 110, max: 180 } },
		{ upToIn: 0.1875, label: '3/16 in', amps: { min: 140, max: 220 } },
		{ upToIn: 0.25, label: '1/4 in', amps: { min: 170, max: 260 } },
		{ upToIn: 0.3125, label: '5/16 in', amps: { min: 190, max: 290 } },
		{ upToIn: 0.375, label: '3/8 in', amps: { min: 210, max: 320 } },
		{ upToIn: 0.5, label: '1/2 in (multi-pass)', amps: { min: 230, max: 350 } }
	] as readonly GmawThicknessRow[]
} as const;
