// PQRs: the actual values used on the coupon (stored, SI), the test results, and the form that
// edits both with quantities as text in the reader's units.
import { z } from 'zod';
import { CURRENT_TYPES, JOINT_TYPES, POSITIONS, PROCESSES, TRANSFERS } from '$lib/records/options';
import { ENERGY_UNITS, STRENGTH_UNITS, TEST_KINDS, TEST_RESULTS } from '$lib/procedures/options';
import { readQuantity, type QuantityKind } from '$lib/procedures/quantities';
import { PQR_CODES } from '$lib/procedures/default-code';

const finite = z.number().finite().nullable();
const str = (max: number) => z.string().max(max);

export const pqrValuesSchema = z.object({
	v: z.literal(1),
	process: z.enum(PROCESSES),
	currentType: z.enum(CURRENT_TYPES).nullable(),
	transfer: z.enum(TRANSFERS).nullable(),
	amps: finite,
	volts: finite,
	travelSpeedMmPerS: finite,
	wireFeedMmPerS: finite,
	fillerClass: str(40),
	fillerDiameterMm: finite,
	fNumber: z.number().int().nullable(),
	aNumber: z.number().int().nullable(),
	tungstenClass: str(20),
	tungstenDiameterMm: finite,
	gasName: str(60),
	gasFlowLPerMin: finite,
	baseMetalSpec: str(60),
	baseMetalFamily: str(16).nullable(),
	pNumber: str(8).nullable(),
	/** The coupon thickness T and the unit system it was given in (QW-451.1 rows differ). */
	couponThicknessMm: finite,
	couponUnit: z.enum(['in', 'mm']),
	depositedThicknessMm: finite,
	testPosition: z.enum(['', ...POSITIONS]),
	jointType: z.enum(['', ...JOINT_TYPES]),
	preheatC: finite,
	interpassC: finite,
	pwht: str(200),
	weldedOn: str(10),
	welder: str(120),
	lab: str(120)
});
export type PqrValues = z.output<typeof pqrValuesSchema>;

export const testResultSchema = z.object({
	kind: z.enum(TEST_KINDS),
	result: z.enum(['', ...TEST_RESULTS]),
	notes: str(500),
	values: z.array(z.object({ label: str(40), value: z.number().finite(), unit: str(12) })).max(4)
});
export type TestResult = z.output<typeof testResultSchema>;
export const testsSchema = z.array(testResultSchema).max(TEST_KINDS.length);

// ---- the form ----

const text = (max: number) =>
	z.string().trim().max(max, `Keep it under ${max} characters.`).default('');
const quantity = z.string().trim().max(40, 'That is too long for a value.').default('');
const choice = <T extends string>(values: readonly T[], message: string) =>
	z.enum(['', ...values] as [string, ...string[]], message).default('');
const result = choice(TEST_RESULTS, 'Pick pass or fail.');
const number = z
	.string()
	.trim()
	.max(20)
	.default('')
	.refine((s) => s === '' || Number.isFinite(Number(s.replace(',', ''))), 'Enter a number.');

/** The form's quantity fields and what each holds. */
export const PQR_QUANTITIES = {
	amps: 'amps',
	volts: 'volts',
	travelSpeed: 'travel',
	wireFeed: 'wire',
	fillerDiameter: 'diameter',
	tungstenDiameter: 'diameter',
	gasFlow: 'flow',
	couponThickness: 'thickness',
	depositedThickness: 'thickness',
	preheat: 'temperature',
	interpass: 'temperature'
} as const satisfies Record<string, QuantityKind>;

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

export const pqrFormSchema = z
	.object({
		units: z.enum(['imperial', 'metric']).default('imperial'),
		number: text(40)
			.refine((s) => s.length > 0, 'Give the PQR a number.')
			.refine(
				(s) => /^[A-Za-z0-9][A-Za-z0-9 ._/-]*$/.test(s),
				'Use letters, digits, - . _ / and spaces.'
			),
		title: text(120).refine((s) => s.length > 0, 'Give the PQR a title.'),
		// Issue 15. Left out (an older API caller): a new PQR takes the shop's default code, an
		// edited one keeps its own.
		code: z.enum(PQR_CODES, 'Pick the code the coupon was qualified to.').optional(),
		process: z.enum(PROCESSES, 'Pick the process.').default('GTAW'),
		currentType: choice(CURRENT_TYPES, 'Pick DCEN, DCEP or AC.'),
		transfer: choice(TRANSFERS, 'Pick a transfer mode.'),
		fillerClass: text(40),
		tungstenClass: text(20),
		gasName: text(60),
		baseMetalSpec: text(60),
		testPosition: choice(POSITIONS, 'Pick the test position, e.g. 2F or 3G.'),
		jointType: choice(JOINT_TYPES, 'Pick a joint type.'),
		pwht: text(200),
		weldedOn: text(10).refine((s) => s === '' || ISO_DATE.test(s), 'Enter the date welded.'),
		welder: text(120),
		lab: text(120),
		amps: quantity,
		volts: quantity,
		travelSpeed: quantity,
		wireFeed: quantity,
		fillerDiameter: quantity,
		tungstenDiameter: quantity,
		gasFlow: quantity,
		couponThickness: quantity,
		depositedThickness: quantity,
		preheat: quantity,
		interpass: quantity,
		visualResult: result,
		visualNotes: text(500),
		bendResult: result,
		bendNotes: text(500),
		tensileResult: result,
		tensileNotes: text(500),
		tensile1: number,
		tensile2: number,
		tensileUnit: z.enum(STRENGTH_UNITS).default('psi'),
		macroResult: result,
		macroNotes: text(500),
		radiographyResult: result,
		radiographyNotes: text(500),
		impactResult: result,
		impactNotes: text(500),
		impactEnergy: number,
		impactUnit: z.enum(ENERGY_UNITS).default('ft-lbf'),
		impactTemperature: quantity
	})
	.superRefine((v, ctx) => {
		const f = v as unknown as Record<string, string>;
		const fields: [string, QuantityKind][] = [
			...(Object.entries(PQR_QUANTITIES) as [string, QuantityKind][]),
			['impactTemperature', 'temperature']
		];
		for (const [key, kind] of fields) {
			const raw = f[key] ?? '';
			if (raw === '') continue;
			const r = readQuantity(kind, raw, v.units);
			if (!r.ok) ctx.addIssue({ code: 'custom', path: [key], message: r.message });
		}
	});
export type PqrForm = z.output<typeof pqrFormSchema>;

export const addendumSchema = z.object({
	body: z
		.string()
		.trim()
		.min(1, 'Write the correction.')
		.max(2000, 'Keep it under 2000 characters.')
});

const optional = <T extends z.ZodType>(s: T) => s.optional().catch(undefined);
export const pqrFilterSchema = z.object({
	q: optional(z.string().trim().max(80)),
	process: optional(z.enum(PROCESSES)),
	state: optional(z.enum(['draft', 'certified']))
});
