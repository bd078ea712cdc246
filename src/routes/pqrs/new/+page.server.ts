import { redirect } from '@sveltejs/kit';
import { fail, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import { AUTHOR_ROLES, nextNumber } from '$lib/server/procedures';
import { createPqr } from '$lib/server/pqrs';
import { refuse } from '$lib/server/procedures/form-errors';
import { pqrFormSchema } from '$lib/schemas/pqr';
import { pqrCodeFor } from '$lib/procedures/default-code';
import { shopDefaultCode } from '$lib/server/people/shop-settings';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

const schema = zod4(pqrFormSchema);

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...AUTHOR_ROLES);
	const number = await nextNumber(user.shopId, 'pqr', 'GTAW');
	const code = pqrCodeFor(await shopDefaultCode(user.shopId));
	return {
		form: await superValidate({ units: user.unitSystem, number, code }, schema, { errors: false })
	};
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireRole(event, ...AUTHOR_ROLES);
		const form = await superValidate(await postedForm(event.request), schema);
		if (!form.valid) return fail(400, { form });
		let id: number;
		try {
			({ id } = await createPqr(user, form.data, event));
		} catch (e) {
			return refuse(form, e);
		}
		redirect(303, `/pqrs/${id}?done=saved`);
	}
};
