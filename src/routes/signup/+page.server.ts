import { redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { createShop } from '$lib/server/people/create-shop';
import { refuseForm } from '$lib/server/people/form-errors';
import { START_PAGE } from '$lib/roles';
import { signUpSchema } from '$lib/schemas/account';
import type { Actions, PageServerLoad } from './$types';
import { readNewPasswordForm } from '$lib/server/forms/new-password-form';

// Open to anyone by design: this is how a shop first gets onto Beadline. Rate-limited per address.

export const load: PageServerLoad = async ({ locals }) => {
	if (locals.user) redirect(303, START_PAGE[locals.user.role]);
	return { form: await superValidate(zod4(signUpSchema), { id: 'signup' }) };
};

export const actions: Actions = {
	create: async (event) => {
		// Passwords never travel back into the page, valid or not.
		const { form, password, refused } = await readNewPasswordForm(
			event,
			zod4(signUpSchema),
			'signup'
		);
		if (refused) return refused;
		try {
			await createShop({ ...form.data, password }, event);
		} catch (e) {
			return refuseForm(form, e);
		}
		redirect(303, `/signin?welcome&email=${encodeURIComponent(form.data.email)}`);
	}
};
