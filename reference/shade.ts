import { ANSI_Z49_1_SHADE, OSHA_1910_133 } from './sources';
import type { Source } from './types';

export type ShadeProcess = 'SMAW' | 'GMAW-FCAW' | 'GTAW';

export interface ShadeRow {
	process: ShadeProcess;
	/**
	 * Band is [minAmps, maxAmps); OSHA prints shared edges ("60-160", "160-250"). The last band of
	 * a process includes its upper edge: the table prints "150-500", so 500 A is in it.
	 */
	minAmps: number;
	maxAmps: number;
	/** OSHA minimum protective shade. */
	minimum: number;
	/** ANSI Z49.1 / AWS F2.2 suggested comfort shade; null where the guide prints a dash. */
	suggested: number | null;
	source: Source;
	suggestedSource: Source;
}

// A current on a shared edge (e.g. exactly 160 A) is put in the upper, darker band: when two rows
// of a safety table overlap, the darker answer is the safe one. The top edge of each process
// (SMAW 550 A, GMAW/FCAW and GTAW 500 A) is shared with no row, so it stays in the last band.
const row = (
	process: ShadeProcess,
	minAmps: number,
	maxAmps: number,
	minimum: number,
	suggested: number | null
): ShadeRow => ({
	process,
	minAmps,
	maxAmps,
	minimum,
	suggested,
	source: OSHA_1910_133,
	suggestedSource: ANSI_Z49_1_SHADE
});

export const SHADE_TABLE: readonly ShadeRow[] = [
	// SMAW: OSHA also keys these rows by electrode size (<3, 3-5, 5-8, >8 in 1/32 in).
	row('SMAW', 0, 60, 7, null),
	row('SMAW', 60, 160, 8, 10),
	row('SMAW', 160, 250, 10, 12),
	row('SMAW', 250, 550, 11, 14),
	row('GMAW-FCAW', 0, 60, 7, null),
	row('GMAW-FCAW', 60, 160, 10, 11),
	row('GMAW-FCAW', 160, 250, 10, 12),
	row('GMAW-FCAW', 250, 500, 10, 14),
	row('GTAW', 0, 50, 8, 10),
	row('GTAW', 50, 150, 8, 12),
	row('GTAW', 150, 500, 10, 14)
];

export const SHADE_ADVICE =
	'Start with a shade too dark to see the weld zone, then go lighter until you see enough, never below the minimum.';
