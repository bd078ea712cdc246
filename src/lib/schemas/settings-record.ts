// One settings record schema for the form (client and server) and the JSON API. Quantities are
// text, read by the weld core's parsers, so "3/32", "1-1/2" and "2.4 mm" all work.
import { z } from 'zod';
import {
	CURRENT_TYPES,
	JOINT_TYPES,
	METAL_FAMILIES,
	OUTCOME_KINDS,
	POSITIONS,
	PROCESSES,
	TRANSFERS
} from '$lib/records/options';
import {
	baseMetalOf,
	QUANTITY_FIELDS,
	readQuantity,
	type QuantityField
} from '$lib/records/values';

const text = (max: number) =>
	z.string().trim().max(max, `Keep it under ${max} characters.`).default('');
const choice = <T extends string>(values: readonly T[], message: string) =>
	z.enum(['', ...values] as [string, ...string[]], message).default('');
const quantity = z.string().trim().max(40, 'That is too long for a value.').default('');

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

export const recordShape = {
	units: z.enum(['imperial', 'metric']).default('imperial'),
	process: z.enum(PROCESSES, 'Pick the process.').default('GTAW'),
	currentType: choice(CURRENT_TYPES, 'Pick DCEN, DCEP or AC.'),
	transfer: choice(TRANSFERS, 'Pick a transfer mode.'),
	amps: quantity,
	volts: quantity,
	wireFeed: quantity,
	travelSpeed: quantity,
	fillerClass: text(40),
	fillerDiameter: quantity,
	tungstenClass: text(20),
	tungstenDiameter: quantity,
	gasName: text(60),
	gasFlow: quantity,
	baseMetalSpec: text(60),
	thickness: quantity,
	jointType: choice(JOINT_TYPES, 'Pick a joint type.'),
	position: choice(POSITIONS, 'Pick a position such as 2F or 3G.'),
	preheat: quantity,
	interpass: quantity,
	machine: text(80),
	jobRef: text(80),
	outcome: text(60),
	defects: text(500),
	notes: text(2000),
	weldedOn: z
		.string()
		.trim()
		.default('')
		.refine((s) => ISO_DATE.test(s) && !Number.isNaN(Date.parse(s)), 'Enter the date welded.')
		.refine((s) => s <= nextDay(), 'The date is in the future.')
};

/** A day of slack: the bench may be ahead of UTC. */
function nextDay(): string {
	return new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);
}

/** Every quantity must read; the message is the parser's own, at the field. */
export const settingsRecordSchema = z.object(recordShape).superRefine((v, ctx) => {
	const family = baseMetalOf(v.baseMetalSpec).family ?? undefined;
	for (const field of Object.keys(QUANTITY_FIELDS) as QuantityField[]) {
		const raw = v[field];
		if (raw === '') continue;
		const r = readQuantity(field, raw, v.units, family);
		if (!r.ok) ctx.addIssue({ code: 'custom', path: [field], message: r.message });
	}
});

export type SettingsRecordForm = z.output<typeof settingsRecordSchema>;

// ---- the API's body: the same schema, with quantities also as { value, unit } or numbers, and
// the checks contract's nested names (filler.diameter, gas.flow, baseMetal.spec) understood ----

const NESTED: Record<string, Record<string, string>> = {
	filler: { classification: 'fillerClass', diameter: 'fillerDiameter' },
	tungsten: { classification: 'tungstenClass', diameter: 'tungstenDiameter' },
	gas: { name: 'gasName', flow: 'gasFlow' },
	baseMetal: { spec: 'baseMetalSpec' }
};

function asText(v: unknown): unknown {
	if (typeof v === 'number') return String(v);
	if (v && typeof v === 'object' && 'value' in v) {
		const o = v as { value: unknown; unit?: unknown };
		return typeof o.value === 'number'
			? `${o.value} ${typeof o.unit === 'string' ? o.unit : ''}`.trim()
			: '';
	}
	return v;
}

/** Flattens an API body into the form's field names; anything unknown is dropped by the schema. */
export function flattenApiBody(raw: unknown): unknown {
	if (!raw || typeof raw !== 'object' || Array.isArray(raw)) return raw;
	const out: Record<string, unknown> = {};
	for (const [key, value] of Object.entries(raw as Record<string, unknown>)) {
		const nested = NESTED[key];
		if (nested && value && typeof value === 'object' && !('value' in value)) {
			for (const [k, v] of Object.entries(value as Record<string, unknown>))
				if (nested[k]) out[nested[k]] = asText(v);
		} else out[key] = asText(value);
	}
	return out;
}

/** The API's body; a record sent without a date is taken as welded today (UTC). */
export const settingsRecordApiSchema = z.preprocess((raw) => {
	const flat = flattenApiBody(raw);
	if (flat && typeof flat === 'object' && !('weldedOn' in flat))
		return { ...flat, weldedOn: new Date().toISOString().slice(0, 10) };
	return flat;
}, settingsRecordSchema);

// ---- the list's filters, read from the URL; a value that does not read is dropped ----

const optional = <T extends z.ZodType>(s: T) => s.optional().catch(undefined);

export const recordFilterSchema = z.object({
	q: optional(z.string().trim().max(80)),
	process: optional(z.enum(PROCESSES)),
	family: optional(z.enum(METAL_FAMILIES)),
	tmin: optional(z.string().trim().max(40)),
	tmax: optional(z.string().trim().max(40)),
	filler: optional(z.string().trim().max(40)),
	position: optional(z.enum(POSITIONS)),
	outcome: optional(z.enum(OUTCOME_KINDS)),
	author: optional(z.uuid()),
	from: optional(z.string().regex(ISO_DATE)),
	to: optional(z.string().regex(ISO_DATE)),
	sort: z
		.enum(['weldedOn', 'amps', 'thickness', 'process', 'filler', 'outcome', 'created'])
		.catch('weldedOn')
		.default('weldedOn'),
	dir: z.enum(['asc', 'desc']).catch('desc').default('desc'),
	page: z.coerce.number().int().min(1).max(100_000).catch(1).default(1)
});

export type RecordFilterInput = z.output<typeof recordFilterSchema>;

/** Reads the filters from a URL's search params (empty values count as not given). */
export function readFilters(params: URLSearchParams): RecordFilterInput {
	const raw: Record<string, string> = {};
	for (const [k, v] of params) if (v.trim() !== '' && !(k in raw)) raw[k] = v;
	return recordFilterSchema.parse(raw);
}
