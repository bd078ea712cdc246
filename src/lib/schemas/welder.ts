// Welders, qualifications (WPQ) and continuity: one definition for the forms (client and server)
// and the JSON API. Lengths are text read by the weld core's parser ("3/8", "9.5 mm").
import { z } from 'zod';
import { QW_461_9 } from '$reference/asme-ix-qw-461-9';
import { parseLength } from '$lib/weld/units';

export const WELD_PROCESSES = ['GTAW', 'GMAW', 'FCAW', 'SMAW'] as const;
export const QUALIFICATION_CODES = ['ASME IX', 'AWS D1.1', 'ISO 9606-1'] as const;
export const COUPON_TYPES = ['plate', 'pipe'] as const;
export const BACKINGS = ['with', 'without'] as const;
export const WELD_CURRENTS = ['DCEN', 'DCEP', 'AC'] as const;

/** Test positions QW-461.9 knows for each coupon form. */
export const TEST_POSITIONS_BY_FORM = {
	plate: QW_461_9.filter((r) => r.form === 'plate').map((r) => r.test),
	pipe: QW_461_9.filter((r) => r.form === 'pipe').map((r) => r.test)
} as const;
const ALL_TEST_POSITIONS = [...new Set(QW_461_9.map((r) => r.test))] as [string, ...string[]];

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;
const text = (max: number) =>
	z.string().trim().max(max, `Keep it under ${max} characters.`).default('');
const choice = <T extends string>(values: readonly T[], message: string) =>
	z.enum(['', ...values] as [string, ...string[]], message).default('');

/** A calendar date not later than tomorrow (a day of slack for time zones). */
export const pastDate = (what: string) =>
	z
		.string()
		.trim()
		.default('')
		.refine((s) => ISO_DATE.test(s) && !Number.isNaN(Date.parse(s)), `Enter the ${what}.`)
		.refine(
			(s) => s <= new Date(Date.now() + 86_400_000).toISOString().slice(0, 10),
			'The date is in the future.'
		);

export const welderSchema = z.object({
	name: z
		.string('Enter the welder’s name.')
		.trim()
		.min(1, 'Enter the welder’s name.')
		.max(120, 'Keep it under 120.'),
	stamp: z
		.string('Enter the shop’s welder ID or stamp.')
		.trim()
		.min(1, 'Enter the shop’s welder ID or stamp.')
		.max(20, 'Keep the ID under 20 characters.')
		.regex(/^[A-Za-z0-9][A-Za-z0-9 ._/-]*$/, 'Use letters, digits, spaces and . _ / -'),
	email: z
		.string()
		.trim()
		.toLowerCase()
		.max(254, 'That e-mail address is too long.')
		.default('')
		.refine((s) => s === '' || z.email().safeParse(s).success, 'Enter an e-mail like a@b.com.'),
	userId: z
		.string()
		.default('')
		.refine((s) => s === '' || z.uuid().safeParse(s).success, 'Pick an account from the list.'),
	// No default: an unticked checkbox posts nothing and must read as false.
	active: z.boolean()
});
export type WelderInput = z.output<typeof welderSchema>;

/** The API's body: `active` may be left out (a new welder is active). */
export const welderApiSchema = welderSchema.extend({ active: z.boolean().default(true) });

const length = (what: string, required: boolean) =>
	z
		.string()
		.trim()
		.max(40, 'That is too long for a length.')
		.default('')
		.refine((s) => !required || s !== '', `Enter the ${what}.`);

export const qualificationSchema = z
	.object({
		units: z.enum(['imperial', 'metric']).default('imperial'),
		process: z.enum(WELD_PROCESSES, 'Pick the process.').default('GTAW'),
		code: z.enum(QUALIFICATION_CODES, 'Pick the code the test followed.').default('ASME IX'),
		testDate: pastDate('test date'),
		wpsRef: text(60),
		testPositions: z
			.array(z.enum(ALL_TEST_POSITIONS, 'Unknown test position.'))
			.min(1, 'Pick the test position.')
			.max(4, 'Pick at most four positions.')
			.default([]),
		couponType: z.enum(COUPON_TYPES, 'Pick plate or pipe.').default('plate'),
		couponDiameter: length('pipe outside diameter', false),
		couponThickness: length('coupon thickness', true),
		depositThickness: length('deposited weld metal thickness', true),
		depositLayers: z
			.string()
			.trim()
			.default('')
			.refine((s) => /^(\d{1,2})?$/.test(s), 'Enter a whole number of layers.'),
		fNumber: z
			.string()
			.trim()
			.default('')
			.refine((s) => /^(\d{1,2})?$/.test(s), 'Enter the F-Number as a number, e.g. 6.'),
		fillerClass: text(40),
		backing: choice(BACKINGS, 'Pick with or without backing.'),
		currentType: choice(WELD_CURRENTS, 'Pick DCEN, DCEP or AC.'),
		results: text(1000),
		witnessedBy: text(120)
	})
	.superRefine((v, ctx) => {
		const unit = v.units === 'metric' ? 'mm' : 'in';
		for (const f of ['couponThickness', 'depositThickness', 'couponDiameter'] as const) {
			if (v[f] === '') continue;
			const r = parseLength(v[f], unit);
			if (!r.ok) ctx.addIssue({ code: 'custom', path: [f], message: r.message });
		}
		if (v.couponType === 'pipe' && v.couponDiameter === '')
			ctx.addIssue({ code: 'custom', path: ['couponDiameter'], message: 'Enter the pipe OD.' });
		const known: readonly string[] = TEST_POSITIONS_BY_FORM[v.couponType];
		const wrong = v.testPositions.filter((p) => !known.includes(p));
		if (wrong.length)
			ctx.addIssue({
				code: 'custom',
				path: ['testPositions'],
				message: `${wrong.join(', ')} is not a ${v.couponType} test position in QW-461.9.`
			});
		const t = parseLength(v.depositThickness, unit);
		const T = parseLength(v.couponThickness, unit);
		if (t.ok && T.ok && t.mm > T.mm + 1e-9)
			ctx.addIssue({
				code: 'custom',
				path: ['depositThickness'],
				message: 'The deposit cannot be thicker than the coupon.'
			});
	});
export type QualificationInput = z.output<typeof qualificationSchema>;

export const continuitySchema = z.object({
	process: z.enum(WELD_PROCESSES, 'Pick the process.').default('GTAW'),
	usedOn: pastDate('date the process was used'),
	note: z
		.string()
		.trim()
		.min(3, 'Say what the welder welded (job, part or WPS).')
		.max(500, 'Keep the note under 500 characters.')
		.default('')
});
export type ContinuityInput = z.output<typeof continuitySchema>;

export const confirmationSchema = z.object({
	qualificationId: z.coerce.number().int().positive('Pick a qualification.'),
	confirmedOn: pastDate('date of the confirmation'),
	responsiblePerson: z
		.string()
		.trim()
		.min(2, 'Enter the responsible person’s name.')
		.max(120, 'Keep it under 120 characters.'),
	note: text(500)
});

/** Withdrawing a qualification (a failed retest, a misconduct finding, a record in error). */
export const withdrawQualificationSchema = z.object({
	qualificationId: z.coerce.number().int().positive('Pick a qualification.'),
	reason: z
		.string('Say why the qualification is withdrawn.')
		.trim()
		.min(3, 'Say why the qualification is withdrawn.')
		.max(500, 'Keep the reason under 500 characters.')
});
export type WithdrawQualificationInput = z.output<typeof withdrawQualificationSchema>;

/** The welder's own one-tap log: only the process; the date is the server's today. */
export const tapSchema = z.object({ process: z.enum(WELD_PROCESSES, 'Unknown process.') });

export const overviewFilterSchema = z.object({
	q: z.string().trim().max(80).catch(''),
	process: z.enum(['', ...WELD_PROCESSES]).catch(''),
	status: z.enum(['', 'current', 'due', 'lapsed']).catch('')
});
export type OverviewFilter = z.output<typeof overviewFilterSchema>;
