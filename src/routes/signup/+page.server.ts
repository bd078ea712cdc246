import { redirect } from '@sveltejs/kit';
import { fail, message, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { formLimiter } from '$lib/server/auth/rate-limit';
import { createShop } from '$lib/server/people/create-shop';
import { refuseForm } from '$lib/server/people/form-errors';
import { START_PAGE } from '$lib/roles';
import { signUpSchema } from '$lib/schemas/account';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

// Open to anyone by design: this is how a shop first gets onto Beadline. Rate-limited per address.

export const load: PageServerLoad = async ({ locals }) => {
	if (locals.user) redirect(303, START_PAGE[locals.user.role]);
	return { form: await superValidate(zod4(signUpSchema), { id: 'signup' }) };
};

export const actions: Actions = {
	create: async (event) => {
		const form = await superValidate(await postedForm(event.request), zod4(signUpSchema), {
			id: 'signup'
		});
		// Passwords never travel back into the page, valid or not.
		const { password } = form.data;
		form.data.password = '';
		form.data.confirm = '';
		if (!form.valid) return fail(400, { form });
		if (await formLimiter.isLimited(event)) {
			return message(form, 'Too many attempts from here. Wait a minute and try again.', {
				status: 429
			});
		}
		try {
			await createShop({ ...form.data, password }, event);
		} catch (e) {
			return refuseForm(form, e);
		}
		redirect(303, `/signin?welcome&email=${encodeURIComponent(form.data.email)}`);
	}
};
