import { redirect } from '@sveltejs/kit';
import { fail, message, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { currentMember } from '$lib/server/auth/current-member';
import { requireMember } from '$lib/server/auth/guards';
import { refuseForm } from '$lib/server/people/form-errors';
import {
	changePassword,
	getProfile,
	signOutMyDevices,
	updateProfile
} from '$lib/server/people/profile';
import { changePasswordSchema, profileSchema } from '$lib/schemas/account';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

export const load: PageServerLoad = async (event) => {
	const me = requireMember(event);
	const profile = await getProfile(me);
	const [profileForm, passwordForm] = await Promise.all([
		superValidate({ name: profile.name, unitSystem: profile.unitSystem }, zod4(profileSchema), {
			id: 'profile'
		}),
		superValidate(zod4(changePasswordSchema), { id: 'password' })
	]);
	return { email: profile.email, profileForm, passwordForm };
};

export const actions: Actions = {
	profile: async (event) => {
		const me = requireMember(event);
		const form = await superValidate(await postedForm(event.request), zod4(profileSchema), {
			id: 'profile'
		});
		if (!form.valid) return fail(400, { form });
		try {
			await updateProfile(me, form.data, event);
		} catch (e) {
			return refuseForm(form, e);
		}
		// The layout of this same response (no JavaScript) must already show the new name.
		event.locals.user = await currentMember(event);
		return message(form, { tone: 'success', text: 'Profile saved.' });
	},
	password: async (event) => {
		const me = requireMember(event);
		const form = await superValidate(await postedForm(event.request), zod4(changePasswordSchema), {
			id: 'password'
		});
		const { current, password } = form.data;
		form.data = { current: '', password: '', confirm: '' };
		if (!form.valid) return fail(400, { form });
		try {
			await changePassword(me, { current, password }, event);
		} catch (e) {
			return refuseForm(form, e);
		}
		// Every session ended with the old password, this one too: sign in with the new one.
		redirect(303, `/signin?welcome&email=${encodeURIComponent(me.email)}`);
	},
	signOutEverywhere: async (event) => {
		const me = requireMember(event);
		await signOutMyDevices(me, event);
		redirect(303, '/signin');
	}
};
