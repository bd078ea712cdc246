// Procedures: the revision's variables document (stored, SI), the editor's form (text in the
// reader's units), and the small forms around them. One definition for forms and the API.
import { z } from 'zod';
import {
	CURRENT_TYPES,
	JOINT_TYPES,
	METAL_FAMILIES,
	POSITIONS,
	PROCESSES,
	TRANSFERS
} from '$lib/records/options';
import { BEADS, CODES, PASSES, PROGRESSIONS, REVISION_STATES } from '$lib/procedures/options';
import { readQuantity } from '$lib/procedures/quantities';
import {
	RANGE_FIELDS,
	SINGLE_FIELDS,
	type RangeField,
	type SingleField
} from '$lib/procedures/fields';

// ---- the stored document ----

const finite = z.number().finite();
const range = z
	.object({ min: finite.nullable(), max: finite.nullable() })
	.refine(
		(r) => r.min === null || r.max === null || r.min <= r.max,
		'The minimum is above the maximum.'
	);
const str = (max: number) => z.string().max(max);
const list = (item: z.ZodType<string>, max = 12) => z.array(item).max(max);

export const variablesSchema = z.object({
	v: z.literal(1),
	title: str(120),
	code: z.enum(CODES),
	codeEdition: str(60),
	scope: str(500),
	process: z.enum(PROCESSES),
	joints: z.object({ types: list(z.enum(JOINT_TYPES)), design: str(300), backing: str(120) }),
	baseMetals: z.object({
		specs: list(str(60)),
		family: z.enum(METAL_FAMILIES).nullable(),
		pNumbers: list(str(8)),
		thicknessMm: range
	}),
	fillerMetals: z.object({
		classifications: list(str(40)),
		fNumbers: z.array(z.number().int()).max(12),
		aNumbers: z.array(z.number().int()).max(12),
		diameterMm: range
	}),
	positions: z.object({
		allowed: list(z.enum(POSITIONS)),
		progression: z.enum(['', ...PROGRESSIONS])
	}),
	preheat: z.object({ minC: finite.nullable(), interpassMaxC: finite.nullable() }),
	pwht: z.object({ required: z.boolean(), temperatureC: range, notes: str(300) }),
	gas: z.object({ shielding: str(60), flowLPerMin: range, backing: str(60) }),
	electrical: z.object({
		currentType: z.enum(CURRENT_TYPES).nullable(),
		transfer: z.enum(TRANSFERS).nullable(),
		amps: range,
		volts: range,
		wireFeedMmPerS: range,
		tungstenClass: str(20),
		tungstenDiameterMm: range,
		heatInputMaxJPerMm: finite.nullable()
	}),
	technique: z.object({
		travelSpeedMmPerS: range,
		bead: z.enum(['', ...BEADS]),
		passes: z.enum(['', ...PASSES]),
		cleaning: str(200),
		notes: str(1000)
	})
});

export type RevisionVariables = z.output<typeof variablesSchema>;
export type Range = z.output<typeof range>;

// ---- the editor's form: quantities as text in the reader's units ----

const text = (max: number) =>
	z.string().trim().max(max, `Keep it under ${max} characters.`).default('');
const quantity = z.string().trim().max(40, 'That is too long for a value.').default('');
const choice = <T extends string>(values: readonly T[], message: string) =>
	z.enum(['', ...values] as [string, ...string[]], message).default('');

const quantityShape = Object.fromEntries([
	...Object.keys(RANGE_FIELDS).flatMap((k) => [
		[`${k}Min`, quantity],
		[`${k}Max`, quantity]
	]),
	...Object.keys(SINGLE_FIELDS).map((k) => [k, quantity])
]) as { [K in `${RangeField}Min` | `${RangeField}Max` | SingleField]: typeof quantity };

export const revisionFormSchema = z
	.object({
		units: z.enum(['imperial', 'metric']).default('imperial'),
		title: text(120).refine((s) => s.length > 0, 'Give the procedure a title.'),
		code: z.enum(CODES, 'Pick the code the procedure follows.').default('aws-d1.1'),
		codeEdition: text(60),
		scope: text(500),
		process: z.enum(PROCESSES, 'Pick the process.').default('GTAW'),
		currentType: choice(CURRENT_TYPES, 'Pick DCEN, DCEP or AC.'),
		transfer: choice(TRANSFERS, 'Pick a transfer mode.'),
		jointTypes: z.array(z.enum(JOINT_TYPES, 'Pick joint types from the list.')).max(6).default([]),
		jointDesign: text(300),
		backing: text(120),
		baseMetalSpecs: text(300),
		fillerClasses: text(300),
		tungstenClass: text(20),
		positions: z.array(z.enum(POSITIONS, 'Pick positions from the list.')).max(10).default([]),
		progression: choice(PROGRESSIONS, 'Pick uphill or downhill.'),
		gasName: text(60),
		backingGas: text(60),
		pwhtRequired: z.enum(['no', 'yes']).default('no'),
		pwhtNotes: text(300),
		bead: choice(BEADS, 'Pick a bead type.'),
		passes: choice(PASSES, 'Pick single or multiple passes.'),
		cleaning: text(200),
		techniqueNotes: text(1000),
		pqrIds: z.array(z.number().int().positive()).max(10).default([]),
		recordIds: text(200).refine(
			(s) => /^[\d\s,#]*$/.test(s),
			'List record numbers separated by commas, e.g. 12, 15.'
		),
		...quantityShape
	})
	.superRefine((v, ctx) => {
		const f = v as unknown as Record<string, string>;
		const system = v.units;
		const read = (key: string, kind: Parameters<typeof readQuantity>[0]) => {
			const raw = f[key] ?? '';
			if (raw === '') return null;
			const r = readQuantity(kind, raw, system);
			if (!r.ok) ctx.addIssue({ code: 'custom', path: [key], message: r.message });
			return r.ok ? r.value : null;
		};
		for (const [key, spec] of Object.entries(RANGE_FIELDS)) {
			const min = read(`${key}Min`, spec.kind);
			const max = read(`${key}Max`, spec.kind);
			if (min !== null && max !== null && min > max)
				ctx.addIssue({
					code: 'custom',
					path: [`${key}Max`],
					message: 'The maximum is below the minimum.'
				});
		}
		for (const [key, spec] of Object.entries(SINGLE_FIELDS)) read(key, spec.kind);
	});

export type RevisionForm = z.output<typeof revisionFormSchema>;

// ---- creating a procedure, deciding, withdrawing ----

export const newProcedureSchema = z.object({
	number: text(40)
		.refine((s) => s.length > 0, 'Give the procedure a number.')
		.refine(
			(s) => /^[A-Za-z0-9][A-Za-z0-9 ._/-]*$/.test(s),
			'Use letters, digits, - . _ / and spaces.'
		),
	title: text(120).refine((s) => s.length > 0, 'Give the procedure a title.'),
	code: z.enum(CODES, 'Pick the code the procedure follows.').default('aws-d1.1'),
	process: z.enum(PROCESSES, 'Pick the process.').default('GTAW'),
	recordIds: z.array(z.number().int().positive()).max(50).default([])
});
export type NewProcedureForm = z.output<typeof newProcedureSchema>;

export const approveSchema = z.object({
	password: z
		.string()
		.min(1, 'Enter your password to sign.')
		.max(200, 'That password is too long.'),
	comment: text(2000)
});

export const returnSchema = z.object({
	comment: z
		.string()
		.trim()
		.min(1, 'Say what needs to change: a comment is required to return a revision.')
		.max(2000, 'Keep it under 2000 characters.')
});

export const withdrawSchema = z.object({
	reason: z
		.string()
		.trim()
		.min(1, 'Say why the revision is withdrawn.')
		.max(1000, 'Keep it under 1000 characters.')
});

export const numberingSchema = z.object({
	wpsPattern: text(40).refine((s) => s.includes('{seq'), 'The pattern needs {seq} (or {seq:3}).'),
	pqrPattern: text(40).refine((s) => s.includes('{seq'), 'The pattern needs {seq} (or {seq:3}).')
});

// ---- the list's filters, from the URL; a value that does not read is dropped ----

const optional = <T extends z.ZodType>(s: T) => s.optional().catch(undefined);

export const procedureFilterSchema = z.object({
	q: optional(z.string().trim().max(80)),
	state: optional(z.enum(REVISION_STATES)),
	process: optional(z.enum(PROCESSES)),
	code: optional(z.enum(CODES)),
	family: optional(z.enum(METAL_FAMILIES)),
	page: z.coerce.number().int().min(1).max(100_000).catch(1).default(1)
});
export type ProcedureFilters = z.output<typeof procedureFilterSchema>;

export function readProcedureFilters(params: URLSearchParams): ProcedureFilters {
	const raw: Record<string, string> = {};
	for (const [k, v] of params) if (v.trim() !== '' && !(k in raw)) raw[k] = v;
	return procedureFilterSchema.parse(raw);
}
