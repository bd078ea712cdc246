// Lens shade: OSHA 1910.133(a)(5) minimum and ANSI Z49.1 / AWS F2.2 suggested shade.
import { SHADE_ADVICE, SHADE_TABLE, type ShadeProcess, type ShadeRow } from '$reference/shade';
import { OSHA_1910_133 } from '$reference/sources';
import type { Process } from '$reference/types';
import type { CheckContext } from './context';
import { isNum, sourceOf, type Finding, guardCheck } from './findings';
import { ownKey } from './units';

export { SHADE_ADVICE };

export interface Shade {
	minimum: number;
	/** Null where the guide gives no suggestion (the lowest SMAW and GMAW bands). */
	suggested: number | null;
	row: ShadeRow;
	/** True when the current is past the last band's upper edge (which is in the table). */
	aboveTable: boolean;
}

const TABLE_PROCESS: Record<Process, ShadeProcess> = {
	SMAW: 'SMAW',
	GMAW: 'GMAW-FCAW',
	FCAW: 'GMAW-FCAW',
	GTAW: 'GTAW'
};

/**
 * Shade for a process at an amperage; a current on a shared band edge takes the darker row. The
 * last band includes its upper edge (OSHA prints GTAW "150-500": 500 A is in the table).
 */
export function lensShade(process: Process, amps: number): Shade | null {
	const p = ownKey(TABLE_PROCESS, process) ? TABLE_PROCESS[process] : undefined;
	if (!p || !isNum(amps) || amps < 0) return null;
	const rows = SHADE_TABLE.filter((r) => r.process === p);
	const last = rows[rows.length - 1];
	const hit = rows.find(
		(r) => amps >= r.minAmps && (amps < r.maxAmps || (r === last && amps === r.maxAmps))
	);
	const row = hit ?? (last && amps > last.maxAmps ? last : undefined);
	if (!row) return null;
	return { minimum: row.minimum, suggested: row.suggested, row, aboveTable: !hit };
}

function checkLensShadeUnguarded(ctx: CheckContext): Finding | null {
	const { process, amps, lensShade: used } = ctx.s;
	if (!isNum(amps) || !isNum(used)) return null;
	const shade = lensShade(process, amps);
	if (!shade) return null;
	const { minimum, suggested, row } = shade;
	const band = `${row.minAmps === 0 ? `under ${row.maxAmps}` : `${row.minAmps}–${row.maxAmps}`} A`;
	const suggestion = suggested === null ? '' : ` ANSI Z49.1 suggests ${suggested} for comfort.`;
	const beyond = shade.aboveTable ? ` ${amps} A is past the end of the OSHA table; go darker.` : '';
	if (used < minimum)
		return {
			check: 'lens-shade',
			status: 'outside',
			message: `Shade ${used} is below the OSHA minimum of ${minimum} for ${process} at ${band}.${suggestion}${beyond}`,
			value: used,
			expected: { min: minimum, unit: 'shade' },
			source: sourceOf(OSHA_1910_133),
			field: 'lensShade'
		};
	return {
		check: 'lens-shade',
		status: shade.aboveTable ? 'caution' : 'ok',
		message: `Shade ${used} meets the OSHA minimum of ${minimum} for ${process} at ${band}.${suggestion}${beyond} ${SHADE_ADVICE}`,
		value: used,
		expected: { min: minimum, unit: 'shade' },
		source: sourceOf(OSHA_1910_133),
		field: 'lensShade'
	};
}

export const checkLensShade = guardCheck(checkLensShadeUnguarded, null);
