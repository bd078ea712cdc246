import { AWS_D1_1_TABLE_4_5, CONTINUITY_SOURCES } from './sources';
import type { Process, Source } from './types';

/** Months without using a process before a welder qualification lapses. */
export const CONTINUITY_MONTHS = 6;
export const CONTINUITY_SOURCE: Source = CONTINUITY_SOURCES;
/** Days before the lapse date at which the product starts warning (product choice). */
export const CONTINUITY_WARN_DAYS = 30;

/**
 * D1.1 PQR changes that need a new PQR, as fractions of the qualified value. Voltage for GTAW and
 * SMAW is not listed here: the brief's source gives the 7 % rule for the wire processes only.
 */
export const D1_1_REQUALIFICATION: Readonly<
	Record<Process, { amps: number | null; volts: number | null }>
> = {
	GMAW: { amps: 0.1, volts: 0.07 },
	FCAW: { amps: 0.1, volts: 0.07 },
	GTAW: { amps: 0.25, volts: null },
	SMAW: { amps: null, volts: null }
};
export const D1_1_REQUALIFICATION_SOURCE: Source = AWS_D1_1_TABLE_4_5;
