// Within range: a value against a procedure range, and a procedure against its PQR
// (AWS D1.1 requalification triggers).
import { D1_1_REQUALIFICATION, D1_1_REQUALIFICATION_SOURCE } from '$reference/qualification-rules';
import { PROCEDURE_RANGES } from '$reference/sources';
import type { Band, CurrentType, Process, Source, Transfer } from '$reference/types';
import type { CheckId } from './check-catalogue';
import type { CheckContext } from './context';
import { expected, isNum, rangeText, round, sourceOf, type Finding, guardCheck } from './findings';
import { formatSpeed, mmPerSToSpeed } from './units';

export const PROCEDURE_SOURCE: Source = PROCEDURE_RANGES;

export interface RangeCheck {
	check?: CheckId;
	field: string;
	/** What the value is, e.g. "Amperage". */
	label: string;
	unit: string;
	/** How to print a value (defaults to the number and unit). */
	show?: (n: number) => string;
	source?: Source;
	/** Decimal places kept in `value` and `expected`. */
	places?: number;
}

/** A value against a range with no tolerance: outside the range is outside. */
export function checkAgainstRange(
	value: number,
	range: Partial<Band>,
	o: RangeCheck
): Finding | null {
	if (!isNum(value) || !range || !o || typeof o.field !== 'string') return null;
	const min = isNum(range.min) ? range.min : undefined;
	const max = isNum(range.max) ? range.max : undefined;
	if (min === undefined && max === undefined) return null;
	const show = o.show ?? ((n: number) => `${round(n, o.places ?? 1)} ${o.unit}`);
	const low = min !== undefined && value < min - 1e-9;
	const high = max !== undefined && value > max + 1e-9;
	const r = rangeText(min === undefined ? null : show(min), max === undefined ? null : show(max));
	return {
		check: o.check ?? 'within-procedure',
		status: low || high ? 'outside' : 'ok',
		message:
			low || high
				? `${o.label} ${show(value)} is ${low ? 'below' : 'above'} the procedure range (${r}).`
				: `${o.label} ${show(value)} is within the procedure range (${r}).`,
		value: round(value, o.places ?? 1),
		expected: expected({ min, max }, o.unit, o.places ?? 1),
		source: sourceOf(o.source ?? PROCEDURE_SOURCE),
		field: o.field
	};
}

/** Settings record against the procedure's ranges, in the user's units. */
function checkWithinProcedureUnguarded(ctx: CheckContext): Finding[] {
	const p = ctx.s.procedure;
	if (!p) return [];
	const out: (Finding | null)[] = [];
	const { amps, volts, travelSpeedMmPerS, wireFeedMmPerS } = ctx.s;
	if (p.amps && isNum(amps))
		out.push(
			checkAgainstRange(amps, p.amps, { field: 'amps', label: 'Amperage', unit: 'A', places: 0 })
		);
	if (p.volts && isNum(volts))
		out.push(checkAgainstRange(volts, p.volts, { field: 'volts', label: 'Voltage', unit: 'V' }));
	const speed = (
		kind: 'travel' | 'wire',
		field: string,
		label: string,
		v: number | undefined,
		r: Partial<Band> | undefined
	) => {
		if (!r || !isNum(v)) return;
		const unit = ctx.system === 'imperial' ? 'in/min' : kind === 'wire' ? 'm/min' : 'mm/min';
		const to = (n: number) => mmPerSToSpeed(n, unit);
		out.push(
			checkAgainstRange(
				to(v),
				{ min: isNum(r.min) ? to(r.min) : undefined, max: isNum(r.max) ? to(r.max) : undefined },
				{
					field,
					label,
					unit,
					show: (n) => formatSpeed(n / to(1), ctx.system, kind),
					places: unit === 'm/min' ? 2 : 1
				}
			)
		);
	};
	speed('travel', 'travelSpeed', 'Travel speed', travelSpeedMmPerS, p.travelSpeedMmPerS);
	speed('wire', 'wireFeed', 'Wire feed speed', wireFeedMmPerS, p.wireFeedMmPerS);
	return out.filter((f): f is Finding => f !== null);
}

/** One side of the comparison: a value or a range per variable. */
export interface ProcessValues {
	process: Process;
	amps?: number | Partial<Band>;
	volts?: number | Partial<Band>;
	currentType?: CurrentType;
	transfer?: Transfer;
}

const ends = (v: number | Partial<Band> | undefined): number[] =>
	isNum(v) ? [v] : v ? [v.min, v.max].filter(isNum) : [];

function percentTrigger(
	what: 'amps' | 'volts',
	pqr: ProcessValues,
	wps: ProcessValues,
	fraction: number | null
): Finding | null {
	const base = isNum(pqr[what]) ? (pqr[what] as number) : null;
	const proposed = ends(wps[what]);
	if (fraction === null || base === null || base <= 0 || proposed.length === 0) return null;
	const band = { min: base * (1 - fraction), max: base * (1 + fraction) };
	const unit = what === 'amps' ? 'A' : 'V';
	const word = what === 'amps' ? 'Amperage' : 'Voltage';
	const worst = proposed.reduce((a, b) => (Math.abs(b - base) > Math.abs(a - base) ? b : a));
	const change = Math.abs(worst - base) / base;
	const over = change > fraction + 1e-9;
	const p = `${Math.round(fraction * 100)} %`;
	return {
		check: 'requalification',
		status: over ? 'outside' : 'ok',
		message: over
			? `${word} ${round(worst, 1)} ${unit} is ${Math.round(change * 100)} % from the PQR's ${round(base, 1)} ${unit}; D1.1 requires a new PQR beyond ${p} for ${wps.process} (${round(band.min, 1)}–${round(band.max, 1)} ${unit}).`
			: `${word} stays within ${p} of the PQR's ${round(base, 1)} ${unit} (${round(band.min, 1)}–${round(band.max, 1)} ${unit}).`,
		value: round(worst, 1),
		expected: expected(band, unit, 1),
		source: sourceOf(D1_1_REQUALIFICATION_SOURCE),
		field: what
	};
}

function sameTrigger(
	field: 'currentType' | 'transfer',
	label: string,
	pqr: ProcessValues,
	wps: ProcessValues
): Finding | null {
	const a = pqr[field];
	const b = wps[field];
	if (!a || !b) return null;
	const changed = a !== b;
	return {
		check: 'requalification',
		status: changed ? 'outside' : 'ok',
		message: changed
			? `${label} changes from ${a} (PQR) to ${b}; D1.1 requires a new PQR for that.`
			: `${label} ${b} is the same as the PQR.`,
		value: b,
		expected: { unit: a },
		source: sourceOf(D1_1_REQUALIFICATION_SOURCE),
		field
	};
}

/**
 * D1.1 PQR changes that need requalification: amperage over 10 % (GMAW, FCAW) or 25 % (GTAW),
 * voltage over 7 % (GMAW, FCAW), current type or polarity, and (GMAW) transfer mode.
 */
export function requalificationTriggers(pqr: ProcessValues, wps: ProcessValues): Finding[] {
	if (!pqr || !wps || pqr.process !== wps.process || !D1_1_REQUALIFICATION[wps.process]) return [];
	const rule = D1_1_REQUALIFICATION[wps.process];
	const found = [
		percentTrigger('amps', pqr, wps, rule.amps),
		percentTrigger('volts', pqr, wps, rule.volts),
		sameTrigger('currentType', 'Current type and polarity', pqr, wps),
		wps.process === 'GMAW' ? sameTrigger('transfer', 'Transfer mode', pqr, wps) : null
	];
	return found.filter((f): f is Finding => f !== null);
}

export const checkWithinProcedure = guardCheck(checkWithinProcedureUnguarded, [] as Finding[]);
