// Heat input: ASME IX QW-409.1(a) (no efficiency factor) and ISO/TR 17671-1 (with k).
import { K_FACTORS, PROCESS_ISO4063 } from '$reference/heat-input-k';
import { ASME_IX_QW_409_1, ISO_TR_17671_1 } from '$reference/sources';
import type { Process, Source } from '$reference/types';
import type { CheckContext } from './context';
import { isNum, round, sourceOf, type Finding, guardCheck } from './findings';
import { MM_PER_IN, ownKey } from './units';

const positive = (n: unknown): n is number => isNum(n) && n > 0;

/** QW-409.1(a): J/in = V x A x 60 / travel speed in in/min. Null for unusable input. */
export function asmeHeatInputJPerIn(
	volts: number,
	amps: number,
	travelInPerMin: number
): number | null {
	if (!positive(volts) || !positive(amps) || !positive(travelInPerMin)) return null;
	const q = (volts * amps * 60) / travelInPerMin;
	return Number.isFinite(q) ? q : null;
}

/** Arc energy U x I / v in kJ/mm, with v in mm/s. The same quantity as QW-409.1 in J/mm / 1000. */
export function arcEnergyKJPerMm(volts: number, amps: number, travelMmPerS: number): number | null {
	if (!positive(volts) || !positive(amps) || !positive(travelMmPerS)) return null;
	const e = (volts * amps) / travelMmPerS / 1000;
	return Number.isFinite(e) ? e : null;
}

/** ISO/TR 17671-1 thermal efficiency factor for a process. */
export function kFactor(process: Process): { k: number; iso4063: number; source: Source } {
	const iso4063 = (ownKey(PROCESS_ISO4063, process) ? PROCESS_ISO4063[process] : undefined) ?? 135;
	const row = K_FACTORS.find((r) => r.iso4063 === iso4063);
	return { k: row?.k ?? 0.8, iso4063, source: ISO_TR_17671_1 };
}

export interface HeatInput {
	asmeJPerIn: number;
	arcEnergyKJPerMm: number;
	isoKJPerMm: number;
	k: number;
}

/**
 * Heat input in both conventions, rounded as the API prints it (J/in whole, kJ/mm to 3 places).
 * ISO heat input is k times the unrounded arc energy.
 */
export function heatInput(
	process: Process,
	volts: number,
	amps: number,
	travelMmPerS: number
): HeatInput | null {
	const e = arcEnergyKJPerMm(volts, amps, travelMmPerS);
	const asme = asmeHeatInputJPerIn(volts, amps, (travelMmPerS * 60) / MM_PER_IN);
	if (e === null || asme === null) return null;
	const { k } = kFactor(process);
	return {
		asmeJPerIn: Math.round(asme),
		arcEnergyKJPerMm: round(e, 3),
		isoKJPerMm: round(e * k, 3),
		k
	};
}

/**
 * The largest heat input a set of ranges allows: highest volts and amps with the lowest travel
 * speed, as the brief's method says. Returns J/mm without k.
 */
export function maxArcEnergyJPerMm(ranges: {
	volts: { max?: number };
	amps: { max?: number };
	travelSpeedMmPerS: { min?: number };
}): number | null {
	const e = arcEnergyKJPerMm(
		ranges?.volts?.max ?? NaN,
		ranges?.amps?.max ?? NaN,
		ranges?.travelSpeedMmPerS?.min ?? NaN
	);
	return e === null ? null : e * 1000;
}

function checkHeatInputUnguarded(ctx: CheckContext): Finding | null {
	const { process, volts, amps, travelSpeedMmPerS, procedure } = ctx.s;
	const max = procedure?.heatInputMax;
	if (!max || !positive(max.jPerMm) || !isNum(volts) || !isNum(amps) || !isNum(travelSpeedMmPerS))
		return null;
	const e = arcEnergyKJPerMm(volts, amps, travelSpeedMmPerS);
	if (e === null) return null;
	const { k } = kFactor(process);
	const jPerMm = max.basis === 'iso' ? e * 1000 * k : e * 1000;
	const imperial = ctx.system === 'imperial';
	const scale = imperial ? MM_PER_IN : 1;
	const unit = imperial ? 'J/in' : 'J/mm';
	const value = Math.round(jPerMm * scale);
	const limit = Math.round(max.jPerMm * scale);
	if (!Number.isFinite(value) || !Number.isFinite(limit)) return null;
	const over = jPerMm > max.jPerMm * (1 + 1e-9);
	const how =
		max.basis === 'iso'
			? `ISO heat input with k = ${k}`
			: 'heat input (QW-409.1, no efficiency factor)';
	return {
		check: 'heat-input',
		status: over ? 'outside' : 'ok',
		message: over
			? `The ${how} is ${value} ${unit}, above the procedure maximum of ${limit} ${unit}.`
			: `The ${how} is ${value} ${unit}, within the procedure maximum of ${limit} ${unit}.`,
		value,
		expected: { max: limit, unit },
		source: sourceOf(max.basis === 'iso' ? ISO_TR_17671_1 : ASME_IX_QW_409_1),
		field: 'travelSpeed'
	};
}

export const checkHeatInput = guardCheck(checkHeatInputUnguarded, null);
