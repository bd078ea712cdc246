import { redirect } from '@sveltejs/kit';
import { fail, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import { refuseForm } from '$lib/server/people/form-errors';
import { MANAGE_ROLES } from '$lib/server/welders/access';
import { createWelder, linkableAccounts } from '$lib/server/welders/welders';
import { welderSchema } from '$lib/schemas/welder';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...MANAGE_ROLES);
	return {
		form: await superValidate({ active: true }, zod4(welderSchema), { errors: false }),
		accounts: await linkableAccounts(user.shopId)
	};
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireRole(event, ...MANAGE_ROLES);
		const form = await superValidate(await postedForm(event.request), zod4(welderSchema));
		if (!form.valid) return fail(400, { form });
		let id: number;
		try {
			({ id } = await createWelder(user, form.data, event));
		} catch (e) {
			return refuseForm(form, e);
		}
		redirect(303, `/welders/${id}`);
	}
};
