import { redirect } from '@sveltejs/kit';
import { fail, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import { refuseForm, rethrowAsHttp } from '$lib/server/people/form-errors';
import { MANAGE_ROLES } from '$lib/server/welders/access';
import { findWelder, linkableAccounts, updateWelder } from '$lib/server/welders/welders';
import { welderSchema } from '$lib/schemas/welder';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...MANAGE_ROLES);
	const w = await findWelder(user.shopId, Number(event.params.id)).catch(rethrowAsHttp);
	const values = {
		name: w.name,
		stamp: w.stamp,
		email: w.email ?? '',
		userId: w.userId ?? '',
		active: w.active
	};
	return {
		welder: { id: w.id, name: w.name },
		form: await superValidate(values, zod4(welderSchema)),
		accounts: await linkableAccounts(user.shopId, w.userId ?? null)
	};
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireRole(event, ...MANAGE_ROLES);
		const form = await superValidate(await postedForm(event.request), zod4(welderSchema));
		if (!form.valid) return fail(400, { form });
		try {
			await updateWelder(user, Number(event.params.id), form.data, event);
		} catch (e) {
			return refuseForm(form, e);
		}
		redirect(303, `/welders/${event.params.id}`);
	}
};
