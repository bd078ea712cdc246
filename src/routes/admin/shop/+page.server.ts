import { fail, message, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { currentMember } from '$lib/server/auth/current-member';
import { requireRole } from '$lib/server/auth/guards';
import { refuseForm, rethrowAsHttp } from '$lib/server/people/form-errors';
import { getShopSettings, updateShopSettings } from '$lib/server/people/shop-settings';
import { shopSettingsSchema } from '$lib/schemas/account';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

export const load: PageServerLoad = async (event) => {
	const admin = requireRole(event, 'admin');
	const current = await getShopSettings(admin).catch(rethrowAsHttp);
	return { form: await superValidate(current, zod4(shopSettingsSchema), { id: 'shop' }) };
};

export const actions: Actions = {
	save: async (event) => {
		const admin = requireRole(event, 'admin');
		const form = await superValidate(await postedForm(event.request), zod4(shopSettingsSchema), {
			id: 'shop'
		});
		if (!form.valid) return fail(400, { form });
		try {
			await updateShopSettings(admin, form.data, event);
		} catch (e) {
			return refuseForm(form, e);
		}
		// The layout of this same response (no JavaScript) must already show the new name.
		event.locals.user = await currentMember(event);
		return message(form, { tone: 'success', text: 'Shop settings saved.' });
	}
};
