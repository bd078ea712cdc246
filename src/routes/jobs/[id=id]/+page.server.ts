import { fail, message, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import {
	addJoint,
	attachDrawing,
	CSV_EXAMPLE,
	importJoints,
	JOB_AUTHOR_ROLES,
	JOB_VIEW_ROLES,
	jobView,
	JointListError,
	INSPECT_ROLES,
	logWeld,
	MAX_JOB_FILE_BYTES,
	placeMarker,
	recordInspection,
	recordOverride,
	recordRepair,
	REPAIR_ROLES,
	WELD_ROLES
} from '$lib/server/fabrication';
import { DATA_BOOK_ROLES } from '$lib/server/fabrication/data-book/access';
import { dataBooksOf } from '$lib/server/fabrication/data-book/list';
import { postedForm } from '$lib/server/forms/posted-form';
import { Procedure, Welder } from '$lib/server/models';
import { RefusedError } from '$lib/server/people/errors';
import { refuseForm, rethrowAsHttp } from '$lib/server/people/form-errors';
import {
	inspectionSchema,
	jointCsvSchema,
	jointSchema,
	markerSchema,
	overrideSchema,
	repairSchema,
	weldLogSchema
} from '$lib/schemas/job';
import { jobCounts } from '$lib/jobs/status';
import { refusal } from '$lib/server/procedures/form-errors';
import type { Actions, PageServerLoad } from './$types';

const jointForm = zod4(jointSchema);
const csvForm = zod4(jointCsvSchema);
const overrideForm = zod4(overrideSchema);
const inspectionForm = zod4(inspectionSchema);
const repairForm = zod4(repairSchema);

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...JOB_VIEW_ROLES);
	const job = await jobView(user, Number(event.params.id)).catch(rethrowAsHttp);
	const canEdit = JOB_AUTHOR_ROLES.includes(user.role);
	return {
		job,
		canEdit,
		signer: { name: user.name, role: user.role },
		canLog: WELD_ROLES.includes(user.role),
		canInspect: INSPECT_ROLES.includes(user.role),
		canRepair: REPAIR_ROLES.includes(user.role),
		counts: jobCounts(job.joints.map((j) => j.history)),
		dataBooks: await dataBooksOf(user.shopId, job.id),
		canCompileBook: DATA_BOOK_ROLES.includes(user.role),
		welders: REPAIR_ROLES.includes(user.role)
			? (
					await Welder.findAll({
						where: { shopId: user.shopId, active: true },
						order: [['name', 'ASC']]
					})
				).map((w) => ({ id: w.id, name: w.name, stamp: w.stamp }))
			: [],
		overrideForm: await superValidate(overrideForm, { id: 'override', errors: false }),
		inspectionForm: await superValidate(
			{ method: 'VT' as const, extent: '100 %', result: 'accept' as const },
			inspectionForm,
			{ id: 'inspect', errors: false }
		),
		repairForm: await superValidate(repairForm, { id: 'repair', errors: false }),
		created: event.url.searchParams.has('created'),
		csvExample: CSV_EXAMPLE,
		procedures: canEdit
			? (
					await Procedure.findAll({
						where: { shopId: user.shopId },
						attributes: ['number', 'title'],
						order: [['number', 'ASC']],
						limit: 500
					})
				).map((p) => ({ number: p.number, title: p.title }))
			: [],
		jointForm: await superValidate(jointForm, { id: 'joint', errors: false }),
		csvForm: await superValidate(csvForm, { id: 'csv', errors: false })
	};
};

/** A posted file, refused at its field before it is read when it is over the size limit. */
async function postedFile(file: File, field: string) {
	if (file.size > MAX_JOB_FILE_BYTES)
		throw new RefusedError(`${file.name} is over the 20 MB limit.`, field);
	return { bytes: new Uint8Array(await file.arrayBuffer()), name: file.name };
}

/** The drawing panel's outcome, at the field it concerns. */
function drawingRefusal(e: unknown, field: string) {
	const r = refusal(e);
	const at = e instanceof RefusedError && e.field ? e.field : field;
	return fail(r.status, { drawing: { ok: false, field: at, text: r.message } });
}

export const actions: Actions = {
	addJoint: async (event) => {
		const user = requireRole(event, ...JOB_AUTHOR_ROLES);
		const form = await superValidate(await postedForm(event.request), jointForm, { id: 'joint' });
		if (!form.valid) return fail(400, { form });
		try {
			await addJoint(user, Number(event.params.id), form.data, event);
		} catch (e) {
			return refuseForm(form, e);
		}
		return message(form, { tone: 'success' as const, text: `Joint ${form.data.mark} added.` });
	},
	importJoints: async (event) => {
		const user = requireRole(event, ...JOB_AUTHOR_ROLES);
		const form = await superValidate(await postedForm(event.request), csvForm, { id: 'csv' });
		if (!form.valid) return fail(400, { form });
		try {
			const { ids } = await importJoints(user, Number(event.params.id), form.data.csv, event);
			form.data.csv = '';
			return message(form, {
				tone: 'success' as const,
				text: `${ids.length} joint${ids.length === 1 ? '' : 's'} added.`
			});
		} catch (e) {
			// Every row's problem goes back with the pasted text, so it can be fixed in place.
			if (e instanceof JointListError) {
				form.message = { tone: 'error', text: e.message, problems: e.problems };
				return fail(400, { form });
			}
			return refuseForm(form, e);
		}
	},
	log: async (event) => {
		const user = requireRole(event, ...WELD_ROLES);
		const posted = await postedForm(event.request);
		const jointId = Number(posted.get('jointId'));
		const parsed = weldLogSchema.safeParse({ jointId, passes: posted.getAll('passes') });
		if (!parsed.success)
			return fail(400, {
				log: { jointId, ok: false, text: parsed.error.issues[0]?.message ?? 'Tick a pass.' }
			});
		try {
			const r = await logWeld(user, { ...parsed.data, jobId: Number(event.params.id) }, event);
			const text = `Logged ${r.logged.join(', ')}${r.already.length ? `; ${r.already.join(', ')} already logged` : ''}.`;
			return { log: { jointId, ok: true, text } };
		} catch (e) {
			const r = refusal(e);
			return fail(r.status, { log: { jointId, ok: false, text: r.message } });
		}
	},
	override: async (event) => {
		const user = requireRole(event, ...INSPECT_ROLES);
		const form = await superValidate(await postedForm(event.request), overrideForm, {
			id: 'override'
		});
		const input = { ...form.data };
		form.data.password = ''; // the password is never sent back
		if (!form.valid) return fail(400, { form });
		try {
			await recordOverride(user, { ...input, jobId: Number(event.params.id) }, event);
		} catch (e) {
			return refuseForm(form, e);
		}
		return message(form, { tone: 'success' as const, text: 'Override signed.' });
	},
	inspect: async (event) => {
		const user = requireRole(event, ...INSPECT_ROLES);
		const posted = await postedForm(event.request);
		const form = await superValidate(posted, inspectionForm, { id: 'inspect' });
		const input = { ...form.data };
		form.data.password = ''; // the password is never sent back
		if (!form.valid) return fail(400, { form });
		const file = posted.get('report');
		try {
			const report =
				file instanceof File && file.size > 0 ? await postedFile(file, 'report') : null;
			await recordInspection(user, { ...input, jobId: Number(event.params.id), report }, event);
		} catch (e) {
			return refuseForm(form, e);
		}
		return message(form, { tone: 'success' as const, text: 'Inspection signed.' });
	},
	drawing: async (event) => {
		const user = requireRole(event, ...JOB_AUTHOR_ROLES);
		const file = (await postedForm(event.request)).get('drawing');
		try {
			if (!(file instanceof File) || file.size === 0)
				throw new RefusedError('Choose a drawing: a PDF, PNG or JPEG file.', 'drawing');
			await attachDrawing(user, Number(event.params.id), await postedFile(file, 'drawing'), event);
		} catch (e) {
			return drawingRefusal(e, 'drawing');
		}
		return { drawing: { ok: true, field: 'drawing', text: 'Drawing attached.' } };
	},
	mark: async (event) => {
		const user = requireRole(event, ...JOB_AUTHOR_ROLES);
		const posted = Object.fromEntries(await postedForm(event.request));
		const parsed = markerSchema.safeParse(posted);
		if (!parsed.success) {
			const issue = parsed.error.issues[0];
			return fail(400, {
				drawing: { ok: false, field: String(issue?.path[0] ?? 'x'), text: issue?.message ?? '' }
			});
		}
		try {
			await placeMarker(user, Number(event.params.id), parsed.data, event);
		} catch (e) {
			return drawingRefusal(e, 'jointId');
		}
		return { drawing: { ok: true, field: 'jointId', text: 'Marker placed.' } };
	},
	repair: async (event) => {
		const user = requireRole(event, ...REPAIR_ROLES);
		const form = await superValidate(await postedForm(event.request), repairForm, {
			id: 'repair'
		});
		if (!form.valid) return fail(400, { form });
		let round: number;
		try {
			({ round } = await recordRepair(
				user,
				{ ...form.data, jobId: Number(event.params.id) },
				event
			));
		} catch (e) {
			return refuseForm(form, e);
		}
		return message(form, { tone: 'success' as const, text: `Repair ${round} opened.` });
	}
};
