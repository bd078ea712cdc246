// Jobs and their joints: one definition for the forms (client and server), the CSV import and
// the JSON API. Marks are the shop's own (W1, W2, 12-A …).
import { z } from 'zod';
import { CODES } from '$lib/procedures/options';
import { JOINT_TYPES, POSITIONS } from '$lib/records/options';

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;
const required = (max: number, what: string) =>
	z
		.string(`Enter the ${what}.`)
		.trim()
		.min(1, `Enter the ${what}.`)
		.max(max, `Keep it under ${max} characters.`);
const text = (max: number) =>
	z.string().trim().max(max, `Keep it under ${max} characters.`).default('');

export const jobSchema = z.object({
	number: required(40, 'job number'),
	customer: required(120, 'customer'),
	part: required(120, 'part or assembly'),
	drawing: text(60),
	drawingRev: text(20),
	code: z.enum(CODES, 'Pick the governing code.').default('asme-ix'),
	dueOn: z
		.string()
		.trim()
		.default('')
		.refine(
			(s) => s === '' || (ISO_DATE.test(s) && !Number.isNaN(Date.parse(s))),
			'Enter the date as YYYY-MM-DD, or leave it empty.'
		)
});
export type JobForm = z.infer<typeof jobSchema>;

/** A mark: letters, digits and - . / only, so it reads the same on the drawing and in the log. */
export const markSchema = required(20, 'joint mark').regex(
	/^[A-Za-z0-9][A-Za-z0-9./-]*$/,
	'Use letters, digits and - . / only (e.g. W1, 12-A).'
);

export const jointSchema = z.object({
	mark: markSchema,
	jointType: z.enum(JOINT_TYPES, 'Pick the joint type.'),
	size: text(40),
	baseMetals: text(120),
	position: z.enum(POSITIONS, 'Pick the position.'),
	/** The procedure by its number; the revision in force is taken unless `rev` names one. */
	procedure: required(40, 'procedure number'),
	rev: z
		.string()
		.trim()
		.default('')
		.refine(
			(s) => s === '' || /^\d{1,4}$/.test(s),
			'Give the revision as a number, or leave it empty.'
		)
});
export type JointForm = z.infer<typeof jointSchema>;

export const JOINT_CSV_MAX_BYTES = 200_000;
export const JOINT_CSV_MAX_ROWS = 500;

export const jointCsvSchema = z.object({
	csv: z
		.string('Paste the joint list.')
		.trim()
		.min(1, 'Paste the joint list.')
		.max(JOINT_CSV_MAX_BYTES, 'That list is too long; split it into parts of 500 joints.')
});

export const WELD_PASSES = ['root', 'fill', 'cap'] as const;
export const PASS_WORDS: Record<(typeof WELD_PASSES)[number], string> = {
	root: 'Root',
	fill: 'Fill',
	cap: 'Cap'
};

/** "Welded by me today": the passes the welder finished on the joint. */
export const weldLogSchema = z.object({
	jointId: z.coerce.number('Pick the joint.').int().positive('Pick the joint.'),
	passes: z
		.array(z.enum(WELD_PASSES, 'Pick root, fill or cap.'))
		.min(1, 'Tick the passes you welded.')
		.max(3)
});
export type WeldLogForm = z.infer<typeof weldLogSchema>;

/** An inspector's override of a refused weld log: the reason, signed with the password. */
export const overrideSchema = z.object({
	jointId: z.coerce.number('Pick the joint.').int().positive('Pick the joint.'),
	welderId: z.coerce.number('Pick the welder.').int().positive('Pick the welder.'),
	reason: required(500, 'reason for the override'),
	password: z.string('Enter your password to sign.').min(1, 'Enter your password to sign.').max(200)
});
export type OverrideForm = z.infer<typeof overrideSchema>;

export const INSPECTION_METHODS = ['VT', 'PT', 'MT', 'RT', 'UT'] as const;
export const METHOD_WORDS: Record<(typeof INSPECTION_METHODS)[number], string> = {
	VT: 'Visual (VT)',
	PT: 'Liquid penetrant (PT)',
	MT: 'Magnetic particle (MT)',
	RT: 'Radiography (RT)',
	UT: 'Ultrasonic (UT)'
};
export const INSPECTION_RESULTS = ['accept', 'reject'] as const;

/** An examination of one joint, signed by the inspector. */
export const inspectionSchema = z.object({
	jointId: z.coerce.number('Pick the joint.').int().positive('Pick the joint.'),
	method: z.enum(INSPECTION_METHODS, 'Pick the method.'),
	extent: required(60, 'extent (e.g. 100 %, 10 % spot)'),
	result: z.enum(INSPECTION_RESULTS, 'Pick accept or reject.'),
	note: text(500),
	password: z.string('Enter your password to sign.').min(1, 'Enter your password to sign.').max(200)
});
export type InspectionForm = z.infer<typeof inspectionSchema>;

/** A rejected joint's repair: the procedure (and revision) it is repaired to, and the welder. */
export const repairSchema = z.object({
	jointId: z.coerce.number('Pick the joint.').int().positive('Pick the joint.'),
	procedure: required(40, 'repair procedure number'),
	rev: z
		.string()
		.trim()
		.default('')
		.refine(
			(s) => s === '' || /^\d{1,4}$/.test(s),
			'Give the revision as a number, or leave it empty.'
		),
	welderId: z.coerce.number('Pick the welder.').int().positive('Pick the welder.'),
	note: text(500)
});
export type RepairForm = z.infer<typeof repairSchema>;

/** A coordinate on the drawing: a fraction of its width or height, 0 (left/top) to 1. */
const fraction = z
	.union([z.number(), z.string()])
	.transform((v, ctx) => {
		const s = String(v).trim().replace(',', '.');
		if (s === '') return null;
		const n = Number(s);
		if (!Number.isFinite(n) || n < 0 || n > 1) {
			ctx.addIssue({ code: 'custom', message: 'Give a number from 0 to 1 (e.g. 0.25).' });
			return z.NEVER;
		}
		return Math.round(n * 10000) / 10000;
	})
	.nullable()
	.default(null);

/**
 * Where a joint sits on the job's drawing, as fractions of its width (x, from the left) and
 * height (y, from the top). Both empty takes the marker off.
 */
export const markerSchema = z
	.object({
		jointId: z.coerce.number('Pick the joint.').int().positive('Pick the joint.'),
		x: fraction,
		y: fraction
	})
	.superRefine((m, ctx) => {
		if ((m.x === null) !== (m.y === null))
			ctx.addIssue({
				code: 'custom',
				path: [m.x === null ? 'x' : 'y'],
				message: 'Give both across and down, or neither to take the marker off.'
			});
	});
export type MarkerForm = z.infer<typeof markerSchema>;
