// Bodies of the checks API (v1), as in BRIEF.md, and the step from a validated body to the SI
// settings record the weld core reads. Unknown keys are stripped; numbers are capped to sane,
// finite ranges so absurd values come back as field errors, never a 500.
import { z } from 'zod';
import type { WeldSettings } from '$lib/weld/settings';
import {
	flowToLPerMin,
	lengthToMm,
	speedToMmPerS,
	temperatureToC,
	type UnitSystem
} from '$lib/weld/units';

import {
	capped,
	CURRENTS,
	FAMILIES,
	flow,
	length,
	list,
	POSITIONS,
	PROCESSES,
	speed,
	temperature,
	text,
	TRANSFERS
} from './checks-quantities';

export { POSITIONS } from './checks-quantities';
export * from './checks-ranges';

const percent = z.number().min(0, 'Must be zero or more.').max(50, 'Keep it at or under 50 %.');

export const checksBodySchema = z.object({
	process: z.enum(PROCESSES, { error: `Process is one of ${list(PROCESSES)}.` }),
	currentType: z.enum(CURRENTS, { error: `Current type is one of ${list(CURRENTS)}.` }).optional(),
	transfer: z.enum(TRANSFERS, { error: `Transfer is one of ${list(TRANSFERS)}.` }).optional(),
	amps: capped(1500, 'amps').optional(),
	volts: capped(100, 'volts').optional(),
	travelSpeed: speed.optional(),
	wireFeed: speed.optional(),
	thickness: length(508, 'Keep the thickness at or under 20 in (508 mm).').optional(),
	baseMetal: z
		.object({
			spec: text(60, 'base metal spec').optional(),
			family: z.enum(FAMILIES, { error: `Family is one of ${list(FAMILIES)}.` }).optional()
		})
		.refine((b) => b.spec !== undefined || b.family !== undefined, {
			message: 'Give a spec (e.g. A36) or a family (carbon-steel, stainless, aluminium).'
		})
		.optional(),
	filler: z
		.object({
			classification: text(40, 'filler classification').optional(),
			diameter: length(25.4, 'Keep the diameter at or under 1 in (25.4 mm).').optional()
		})
		.optional(),
	tungsten: z
		.object({
			classification: text(40, 'tungsten classification').optional(),
			diameter: length(12.7, 'Keep the diameter at or under 1/2 in (12.7 mm).').optional()
		})
		.optional(),
	gas: z.object({ name: text(60, 'gas name').optional(), flow: flow.optional() }).optional(),
	// Beyond the contract example, all optional: what the preheat, shade and CE checks read.
	position: z.enum(POSITIONS, { error: `Position is one of ${list(POSITIONS)}.` }).optional(),
	preheat: temperature.optional(),
	lensShade: z
		.number()
		.int('A shade is a whole number.')
		.min(1)
		.max(14, 'Shades go up to 14.')
		.optional(),
	chemistry: z
		.object({
			C: percent,
			Mn: percent,
			Cr: percent,
			Mo: percent,
			V: percent,
			Ni: percent,
			Cu: percent
		})
		.partial()
		.optional()
});

export type ChecksBody = z.output<typeof checksBodySchema>;

/** Turns a validated body into the SI record run-checks takes. */
export function checksBodyToSettings(body: ChecksBody): WeldSettings {
	const mm = (q?: { value: number; unit: 'in' | 'mm' }) =>
		q ? lengthToMm(q.value, q.unit) : undefined;
	const mmPerS = (q?: { value: number; unit: 'in/min' | 'mm/s' | 'mm/min' }) =>
		q ? speedToMmPerS(q.value, q.unit) : undefined;
	const s: WeldSettings = {
		process: body.process,
		currentType: body.currentType,
		transfer: body.transfer,
		amps: body.amps,
		volts: body.volts,
		travelSpeedMmPerS: mmPerS(body.travelSpeed),
		wireFeedMmPerS: mmPerS(body.wireFeed),
		thicknessMm: mm(body.thickness),
		baseMetal: body.baseMetal
			? { spec: body.baseMetal.spec, family: body.baseMetal.family }
			: undefined,
		filler: body.filler
			? { classification: body.filler.classification, diameterMm: mm(body.filler.diameter) }
			: undefined,
		tungsten: body.tungsten
			? { classification: body.tungsten.classification, diameterMm: mm(body.tungsten.diameter) }
			: undefined,
		gas: body.gas
			? {
					name: body.gas.name,
					flowLPerMin: body.gas.flow
						? flowToLPerMin(body.gas.flow.value, body.gas.flow.unit)
						: undefined
				}
			: undefined,
		position: body.position,
		preheatC: body.preheat ? temperatureToC(body.preheat.value, body.preheat.unit) : undefined,
		lensShade: body.lensShade,
		chemistry: body.chemistry
	};
	// Drop the keys left undefined so records compare and serialise cleanly.
	return JSON.parse(JSON.stringify(s)) as WeldSettings;
}

/**
 * The unit system the request speaks, from the first quantity it carries (thickness, filler
 * diameter, travel speed, wire feed, gas flow, preheat); imperial when it carries none.
 */
export function bodyUnitSystem(body: ChecksBody): UnitSystem {
	const units = [
		body.thickness?.unit,
		body.filler?.diameter?.unit,
		body.tungsten?.diameter?.unit,
		body.travelSpeed?.unit,
		body.wireFeed?.unit,
		body.gas?.flow?.unit,
		body.preheat?.unit
	];
	const first = units.find((u) => u !== undefined);
	if (first === undefined) return 'imperial';
	return ['in', 'in/min', 'CFH', 'degF'].includes(first) ? 'imperial' : 'metric';
}

/** `{ "<field path>": ["message"] }`, the 400 answer of the API. */
export function checksFieldErrors(err: z.ZodError): Record<string, string[]> {
	const out: Record<string, string[]> = {};
	for (const issue of err.issues)
		(out[issue.path.map(String).join('.')] ??= []).push(issue.message);
	return out;
}

/** Validates and converts in one step, for handlers and forms. Never throws. */
export function parseChecksBody(
	raw: unknown
):
	| { ok: true; settings: WeldSettings; system: UnitSystem }
	| { ok: false; errors: Record<string, string[]> } {
	const r = checksBodySchema.safeParse(raw);
	if (!r.success) return { ok: false, errors: checksFieldErrors(r.error) };
	return { ok: true, settings: checksBodyToSettings(r.data), system: bodyUnitSystem(r.data) };
}
