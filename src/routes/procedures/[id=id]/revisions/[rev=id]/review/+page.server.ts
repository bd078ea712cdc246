import { redirect } from '@sveltejs/kit';
import { fail, message, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import {
	approveRevision,
	getRevision,
	QUEUE_ROLES,
	returnRevision,
	REVIEW_ROLES
} from '$lib/server/procedures';
import { refuse, rethrowAsHttp } from '$lib/server/procedures/form-errors';
import { approveSchema, returnSchema } from '$lib/schemas/procedure';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

const approve = zod4(approveSchema);
const giveBack = zod4(returnSchema);

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...QUEUE_ROLES);
	try {
		const view = await getRevision(user, Number(event.params.id), Number(event.params.rev), event);
		const [approveForm, returnForm] = await Promise.all([
			superValidate(approve, { id: 'approve' }),
			superValidate(giveBack, { id: 'return' })
		]);
		return { view, approveForm, returnForm, signer: { name: user.name, role: user.role } };
	} catch (e) {
		rethrowAsHttp(e);
	}
};

export const actions: Actions = {
	approve: async (event) => {
		const user = requireRole(event, ...REVIEW_ROLES);
		const form = await superValidate(await postedForm(event.request), approve, { id: 'approve' });
		const id = Number(event.params.id);
		const rev = Number(event.params.rev);
		if (!form.valid) {
			form.data.password = '';
			return fail(400, { form });
		}
		let mailed = true;
		try {
			({ mailed } = await approveRevision(user, id, rev, form.data, event));
		} catch (e) {
			// The password is never sent back to the page.
			form.data.password = '';
			return refuse(form, e);
		}
		if (!mailed) return message(form, 'Approved and signed; the author could not be e-mailed.');
		redirect(303, `/procedures/${id}/revisions/${rev}?done=approved`);
	},
	return: async (event) => {
		const user = requireRole(event, ...REVIEW_ROLES);
		const form = await superValidate(await postedForm(event.request), giveBack, { id: 'return' });
		if (!form.valid) return fail(400, { form });
		const id = Number(event.params.id);
		const rev = Number(event.params.rev);
		try {
			await returnRevision(user, id, rev, form.data, event);
		} catch (e) {
			return refuse(form, e);
		}
		redirect(303, `/reviews?done=returned`);
	}
};
