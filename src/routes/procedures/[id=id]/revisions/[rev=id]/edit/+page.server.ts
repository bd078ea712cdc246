import { redirect } from '@sveltejs/kit';
import { fail, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import {
	AUTHOR_ROLES,
	findProcedure,
	findRevision,
	linksOf,
	notDraftMessage,
	readVariables,
	updateDraft
} from '$lib/server/procedures';
import { listPqrs } from '$lib/server/pqrs';
import { refuse, rethrowAsHttp } from '$lib/server/procedures/form-errors';
import { variablesToForm } from '$lib/procedures/variables';
import { revisionFormSchema } from '$lib/schemas/procedure';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

const schema = zod4(revisionFormSchema);

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...AUTHOR_ROLES);
	const id = Number(event.params.id);
	const rev = Number(event.params.rev);
	try {
		const procedure = await findProcedure(user, id);
		const revision = await findRevision(user, id, rev);
		const head = { id, number: procedure.number, rev, state: revision.state };
		// A revision that is not a draft is refused with the reason, never shown as a form.
		if (revision.state !== 'draft')
			return { head, refused: notDraftMessage(rev, revision.state), form: null, pqrOptions: [] };
		const links = await linksOf(revision.id, user.shopId);
		const values = variablesToForm(readVariables(revision).variables, links, user.unitSystem);
		const [form, pqrOptions] = await Promise.all([
			superValidate(values, schema, { errors: false }),
			listPqrs(user)
		]);
		return {
			head,
			refused: null,
			form,
			pqrOptions,
			created: event.url.searchParams.has('created'),
			returnComment: revision.returnComment ?? null
		};
	} catch (e) {
		rethrowAsHttp(e);
	}
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireRole(event, ...AUTHOR_ROLES);
		const id = Number(event.params.id);
		const rev = Number(event.params.rev);
		const form = await superValidate(await postedForm(event.request), schema);
		if (!form.valid) return fail(400, { form });
		try {
			await updateDraft(user, id, rev, form.data, event);
		} catch (e) {
			return refuse(form, e);
		}
		redirect(303, `/procedures/${id}/revisions/${rev}?done=saved`);
	}
};
