import { fail, redirect } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import { AUTHOR_ROLES, CERTIFY_ROLES, objectTrail, VIEW_ROLES } from '$lib/server/procedures';
import { refusal, rethrowAsHttp } from '$lib/server/procedures/form-errors';
import { addAddendum, certifyPqr, getPqr, MAX_REPORT_BYTES, uploadReport } from '$lib/server/pqrs';
import { addendumSchema } from '$lib/schemas/pqr';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const id = Number(event.params.id);
	try {
		const [pqr, trail] = await Promise.all([getPqr(user, id, event), objectTrail(user, 'pqr', id)]);
		return { pqr, trail, system: user.unitSystem, done: event.url.searchParams.get('done') };
	} catch (e) {
		rethrowAsHttp(e);
	}
};

const fails = (e: unknown, key: string) => {
	const r = refusal(e);
	return fail(r.status, { [key]: r.message });
};

export const actions: Actions = {
	upload: async (event) => {
		const user = requireRole(event, ...AUTHOR_ROLES);
		const id = Number(event.params.id);
		const file = (await postedForm(event.request)).get('report');
		if (!(file instanceof File) || file.size === 0)
			return fail(400, { reportError: 'Choose a PDF file.' });
		if (file.size > MAX_REPORT_BYTES)
			return fail(400, { reportError: `${file.name} is over the 20 MB limit.` });
		try {
			await uploadReport(
				user,
				id,
				{ bytes: new Uint8Array(await file.arrayBuffer()), name: file.name },
				event
			);
		} catch (e) {
			return fails(e, 'reportError');
		}
		redirect(303, '?done=uploaded');
	},
	certify: async (event) => {
		const user = requireRole(event, ...CERTIFY_ROLES);
		try {
			await certifyPqr(user, Number(event.params.id), event);
		} catch (e) {
			return fails(e, 'problem');
		}
		redirect(303, '?done=certified');
	},
	addendum: async (event) => {
		const user = requireRole(event, ...AUTHOR_ROLES);
		const parsed = addendumSchema.safeParse(Object.fromEntries(await postedForm(event.request)));
		if (!parsed.success)
			return fail(400, {
				addendumError: parsed.error.issues[0]?.message ?? 'Write the correction.'
			});
		try {
			await addAddendum(user, Number(event.params.id), parsed.data.body, event);
		} catch (e) {
			return fails(e, 'addendumError');
		}
		redirect(303, '?done=addendum');
	}
};
