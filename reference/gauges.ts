import { AWG_ALUMINIUM, BWG_TUBE, MSG_SHEET_STEEL } from './sources';

/**
 * U.S. Standard Gauge (1893) weights in ounces per square foot, gauges 3 to 30. The Manufacturers'
 * Standard Gauge turns these into sheet steel thickness at 41.82 lb/ft2 per inch of thickness.
 */
const USSG_OZ_PER_FT2: Readonly<Record<number, number>> = {
	3: 160,
	4: 150,
	5: 140,
	6: 130,
	7: 120,
	8: 110,
	9: 100,
	10: 90,
	11: 80,
	12: 70,
	13: 60,
	14: 50,
	15: 45,
	16: 40,
	17: 36,
	18: 32,
	19: 28,
	20: 24,
	21: 22,
	22: 20,
	23: 18,
	24: 16,
	25: 14,
	26: 12,
	27: 11,
	28: 10,
	29: 9,
	30: 8
};

const STEEL_LB_PER_FT2_PER_IN = 41.82;

/** Sheet steel thickness in inches, rounded to 4 places as the charts print it. */
export const MSG_STEEL_IN: Readonly<Record<number, number>> = Object.fromEntries(
	Object.entries(USSG_OZ_PER_FT2).map(([g, oz]) => [
		Number(g),
		Math.round((oz / 16 / STEEL_LB_PER_FT2_PER_IN) * 10000) / 10000
	])
);

/** Brown & Sharpe (AWG): defined by formula, so any gauge 0-40 is exact to the definition. */
export const awgInches = (gauge: number): number => 0.005 * Math.pow(92, (36 - gauge) / 39);
export const AWG_RANGE = { min: 0, max: 40 } as const;

/** Birmingham Wire Gauge as used for tube wall thickness (inches). */
export const BWG_TUBE_IN: Readonly<Record<number, number>> = {
	8: 0.165,
	9: 0.148,
	10: 0.134,
	11: 0.12,
	12: 0.109,
	13: 0.095,
	14: 0.083,
	15: 0.072,
	16: 0.065,
	17: 0.058,
	18: 0.049,
	19: 0.042,
	20: 0.035,
	21: 0.032,
	22: 0.028,
	23: 0.025,
	24: 0.022,
	25: 0.02,
	26: 0.018
};

export type GaugeTable = 'sheet-steel' | 'aluminium' | 'tube';

export const GAUGE_SOURCES = {
	'sheet-steel': MSG_SHEET_STEEL,
	aluminium: AWG_ALUMINIUM,
	tube: BWG_TUBE
} as const;
