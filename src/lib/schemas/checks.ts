// Bodies of the checks API (v1), as in BRIEF.md, and the step from a validated body to the SI
// settings record the weld core reads. Unknown keys are stripped; numbers are capped to sane,
// finite ranges so absurd values come back as field errors, never a 500.
import { z } from 'zod';
import { pqrThicknessRange, welderPositions } from '$lib/weld/qualified-ranges';
import type { FindingSource } from '$lib/weld/findings';
import type { WeldSettings } from '$lib/weld/settings';
import {
	flowToLPerMin,
	lengthToMm,
	speedToMmPerS,
	temperatureToC,
	type UnitSystem
} from '$lib/weld/units';

const PROCESSES = ['GTAW', 'GMAW', 'FCAW', 'SMAW'] as const;
const CURRENTS = ['DCEN', 'DCEP', 'AC'] as const;
const TRANSFERS = ['short-circuit', 'globular', 'spray', 'pulsed-spray'] as const;
const FAMILIES = ['carbon-steel', 'stainless', 'aluminium'] as const;

const list = (xs: readonly string[]) => xs.join(', ');

/** A `{ value, unit }` quantity whose SI value must fall in (min, max]. */
function quantity<U extends string>(
	units: readonly [U, ...U[]],
	aliases: Record<string, U>,
	toSi: (value: number, unit: U) => number,
	si: { min: number; max: number; inclusiveMin?: boolean },
	tooBig: string
) {
	const unit = z.preprocess(
		(v) =>
			typeof v === 'string'
				? (aliases[v.trim()] ?? aliases[v.trim().toLowerCase()] ?? v.trim())
				: v,
		z.enum(units, { error: `Use one of: ${list(units)}.` })
	);
	const shape = `Give it as { "value": number, "unit": "${units[0]}" } (unit one of ${list(units)}).`;
	const object = z.object(
		{ value: z.number({ error: 'Give a number.' }), unit },
		{ error: (iss) => (iss.input === undefined ? `Required. ${shape}` : shape) }
	);
	return object.superRefine((q, ctx) => {
		const v = toSi(q.value, q.unit);
		const low = si.inclusiveMin ? v < si.min : v <= si.min;
		if (low)
			ctx.addIssue({
				code: 'custom',
				path: ['value'],
				message: si.min === 0 ? 'Must be more than zero.' : 'That value is too low.'
			});
		else if (v > si.max) ctx.addIssue({ code: 'custom', path: ['value'], message: tooBig });
	});
}

const length = (maxMm: number, tooBig: string) =>
	quantity(
		['in', 'mm'],
		{ inch: 'in', inches: 'in', '"': 'in' },
		lengthToMm,
		{ min: 0, max: maxMm },
		tooBig
	);

const speed = quantity(
	['in/min', 'mm/s', 'mm/min'],
	{ ipm: 'in/min', 'IN/MIN': 'in/min', 'mm/sec': 'mm/s' },
	speedToMmPerS,
	{ min: 0, max: speedToMmPerS(2000, 'in/min') },
	'Keep it at or under 2000 in/min (850 mm/s).'
);

const flow = quantity(
	['CFH', 'L/min'],
	{ cfh: 'CFH', scfh: 'CFH', 'l/min': 'L/min', lpm: 'L/min' },
	flowToLPerMin,
	{ min: 0, max: flowToLPerMin(200, 'CFH') },
	'Keep it at or under 200 CFH (94 L/min).'
);

const temperature = quantity(
	['degF', 'degC'],
	{ '°F': 'degF', '°C': 'degC', F: 'degF', C: 'degC', degf: 'degF', degc: 'degC' },
	temperatureToC,
	{ min: -60, max: 1000, inclusiveMin: true },
	'Keep it at or under 1832 °F (1000 °C).'
);

const text = (max: number, what: string) =>
	z
		.string({ error: `Give the ${what} as text.` })
		.trim()
		.min(1, `Give the ${what}.`)
		.max(max, `Keep the ${what} under ${max} characters.`);

const capped = (max: number, what: string) =>
	z
		.number({ error: `Give ${what} as a number.` })
		.gt(0, `${what[0]?.toUpperCase()}${what.slice(1)} must be more than zero.`)
		.max(max, `Keep ${what} at or under ${max}.`);

// QW-461.9 test positions (checked against the reference table in the tests), plus AWS 6GR.
export const POSITIONS = [
	'1G',
	'2G',
	'3G',
	'4G',
	'5G',
	'6G',
	'1F',
	'2F',
	'3F',
	'4F',
	'5F',
	'2FR',
	'6GR'
] as const;
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

// ---- /api/v1/checks/pqr-ranges ----

const couponLength = length(2540, 'Keep it at or under 100 in (2540 mm).');

// The contract's body carries both T and t, and its answer always carries depositedMax (a
// quantity, never null); QW-451.1 reads that maximum from t, so t is required.
export const pqrRangesBodySchema = z.object({
	process: z.enum(PROCESSES, { error: `Process is one of ${list(PROCESSES)}.` }),
	couponThickness: couponLength,
	depositedThickness: couponLength,
	/** Optional: short-circuit GMAW takes the QW-403.10 limit. */
	transfer: z.enum(TRANSFERS, { error: `Transfer is one of ${list(TRANSFERS)}.` }).optional()
});
export type PqrRangesBody = z.output<typeof pqrRangesBodySchema>;

interface Qty {
	value: number;
	unit: 'in' | 'mm';
}

export type PqrRangesAnswer =
	| {
			ok: true;
			answer: {
				baseMetal: { min: Qty; max: Qty };
				depositedMax: Qty;
				row: string;
				notes: string[];
				source: FindingSource;
			};
	  }
	| { ok: false; errors: Record<string, string[]> };

/** The pqr-ranges answer (QW-451.1), in the units the request used. */
export function pqrRangesAnswer(body: PqrRangesBody): PqrRangesAnswer {
	const transfer = body.process === 'GMAW' ? body.transfer : undefined;
	const r = pqrThicknessRange(body.couponThickness, body.depositedThickness, transfer);
	if (!r.ok) return { ok: false, errors: { couponThickness: [r.message] } };
	if (!r.depositedMax)
		return {
			ok: false,
			errors: { depositedThickness: ['Give the deposited weld metal thickness t.'] }
		};
	return {
		ok: true,
		answer: {
			baseMetal: r.baseMetal,
			depositedMax: r.depositedMax,
			row: r.row,
			notes: r.notes,
			source: r.source
		}
	};
}

// ---- /api/v1/checks/welder-positions ----

export const welderPositionsBodySchema = z.object({
	testPositions: z
		.array(
			z.preprocess(
				(v) => (typeof v === 'string' ? v.trim().toUpperCase() : v),
				z.enum(POSITIONS, { error: `Test position is one of ${list(POSITIONS)}.` })
			),
			{ error: 'Give the test positions as a list, e.g. ["3G"].' }
		)
		.min(1, 'Give at least one test position.')
		.max(10, 'Give at most 10 test positions.')
});
export type WelderPositionsBody = z.output<typeof welderPositionsBodySchema>;

export type WelderPositionsAnswer =
	| {
			ok: true;
			answer: {
				groove: string[];
				fillet: string[];
				groovePipe: string[];
				notes: string[];
				source: FindingSource;
			};
	  }
	| { ok: false; errors: Record<string, string[]> };

/**
 * The welder-positions answer (QW-461.9). `groove` is plate and pipe over 24 in (610 mm) OD;
 * `groovePipe` adds what the table allows on pipe 24 in OD and under.
 */
export function welderPositionsAnswer(body: WelderPositionsBody): WelderPositionsAnswer {
	if (body.testPositions.includes('6GR'))
		return {
			ok: false,
			errors: {
				testPositions: [
					'6GR is an AWS D1.1 test for T-, K- and Y-connections; ASME QW-461.9 has no row for it.'
				]
			}
		};
	const r = welderPositions(body.testPositions);
	return {
		ok: true,
		answer: {
			groove: r.groove,
			fillet: r.fillet,
			groovePipe: r.groovePipe,
			notes: [
				'groove: plate, and pipe over 24 in (610 mm) OD. groovePipe: pipe 24 in OD and under; from plate tests only 2-7/8 in (73 mm) OD and over. Diameter limits: QW-452.3.'
			],
			source: r.source
		}
	};
}
