import { superValidate } from 'sveltekit-superforms';
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
import { rethrowAsHttp } from '$lib/server/procedures/form-errors';
import { variablesToForm } from '$lib/procedures/variables';
import { revisionFormSchema } from '$lib/schemas/procedure';
import type { Actions, PageServerLoad } from './$types';
import { saveThenShow } from '$lib/server/procedures/save-form';

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
		return saveThenShow(event, schema, async (data) => {
			await updateDraft(user, id, rev, data, event);
			return `/procedures/${id}/revisions/${rev}?done=saved`;
		});
	}
};
