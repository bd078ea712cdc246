import { fail, message, superValidate } from 'sveltekit-superforms';
import { RefusedError } from '$lib/server/people/errors';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import { refuseForm, rethrowAsHttp } from '$lib/server/people/form-errors';
import { MANAGE_ROLES, VIEW_ROLES } from '$lib/server/welders/access';
import { recordConfirmation, recordContinuity } from '$lib/server/welders/continuity';
import { localDay } from '$lib/server/welders/dates';
import { welderView } from '$lib/server/welders/read';
import { linkState, revokeLinks } from '$lib/server/welders/verification';
import { withdrawQualification } from '$lib/server/welders/qualifications';
import {
	confirmationSchema,
	continuitySchema,
	withdrawQualificationSchema
} from '$lib/schemas/welder';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const id = Number(event.params.id);
	const today = localDay(new Date(), user.timeZone);
	const welder = await welderView(user.shopId, id, today).catch(rethrowAsHttp);
	const firstProcess = welder.qualifications[0]?.process ?? 'GTAW';
	const iso = welder.qualifications.find((q) => q.code === 'ISO 9606-1');
	return {
		welder,
		today,
		units: user.unitSystem,
		canManage: MANAGE_ROLES.includes(user.role),
		link: await linkState(user.shopId, id),
		useForm: await superValidate({ process: firstProcess, usedOn: today }, zod4(continuitySchema), {
			id: 'use',
			errors: false
		}),
		confirmForm: await superValidate(
			{ qualificationId: iso?.id, confirmedOn: today, responsiblePerson: user.name },
			zod4(confirmationSchema),
			{ id: 'confirm', errors: false }
		)
	};
};

export const actions: Actions = {
	addUse: async (event) => {
		const user = requireRole(event, ...MANAGE_ROLES);
		const form = await superValidate(await postedForm(event.request), zod4(continuitySchema), {
			id: 'use'
		});
		if (!form.valid) return fail(400, { form });
		try {
			const r = await recordContinuity({
				shopId: user.shopId,
				welderId: Number(event.params.id),
				process: form.data.process,
				date: form.data.usedOn,
				source: 'manual',
				note: form.data.note,
				actor: user,
				event
			});
			const text = r.created
				? `Logged ${r.process} on ${r.usedOn}.`
				: `${r.process} on ${r.usedOn} was already logged; nothing changed.`;
			return message(form, { tone: 'success', text });
		} catch (e) {
			return refuseForm(form, e);
		}
	},
	confirm: async (event) => {
		const user = requireRole(event, ...MANAGE_ROLES);
		const form = await superValidate(await postedForm(event.request), zod4(confirmationSchema), {
			id: 'confirm'
		});
		if (!form.valid) return fail(400, { form });
		try {
			await recordConfirmation(user, Number(event.params.id), form.data, event);
			return message(form, { tone: 'success', text: 'Confirmation recorded.' });
		} catch (e) {
			return refuseForm(form, e);
		}
	},
	revokeLink: async (event) => {
		const user = requireRole(event, ...MANAGE_ROLES);
		const n = await revokeLinks(user, Number(event.params.id), event).catch(rethrowAsHttp);
		return {
			revoked: n
				? 'Withdrawn: every card printed so far now reads "withdrawn". The next card gets a new code.'
				: 'There was no live card link to withdraw.'
		};
	},
	// One small form beside each qualification, so a plain post: its error names the qualification.
	withdraw: async (event) => {
		const user = requireRole(event, ...MANAGE_ROLES);
		const posted = Object.fromEntries(await postedForm(event.request));
		const parsed = withdrawQualificationSchema.safeParse(posted);
		const qualificationId = Number(posted.qualificationId) || null;
		const reason = typeof posted.reason === 'string' ? posted.reason.slice(0, 500) : '';
		if (!parsed.success)
			return fail(400, {
				withdraw: { qualificationId, reason, error: parsed.error.issues[0]!.message }
			});
		try {
			await withdrawQualification(user, Number(event.params.id), parsed.data, event);
		} catch (e) {
			if (!(e instanceof RefusedError)) rethrowAsHttp(e);
			return fail(400, { withdraw: { qualificationId, reason, error: e.message } });
		}
		return { withdrawn: qualificationId };
	}
};
