import { redirect } from '@sveltejs/kit';
import { fail, setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import { refuseForm, rethrowAsHttp } from '$lib/server/people/form-errors';
import { RefusedError } from '$lib/server/people/errors';
import { MANAGE_ROLES } from '$lib/server/welders/access';
import { addQualification, MAX_RECORD_BYTES } from '$lib/server/welders/qualifications';
import { findWelder } from '$lib/server/welders/welders';
import { shopDefaultCode } from '$lib/server/people/shop-settings';
import { qualificationCodeFor } from '$lib/procedures/default-code';
import { qualificationSchema } from '$lib/schemas/welder';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...MANAGE_ROLES);
	const w = await findWelder(user.shopId, Number(event.params.id)).catch(rethrowAsHttp);
	const code = qualificationCodeFor(await shopDefaultCode(user.shopId));
	const form = await superValidate({ units: user.unitSystem, code }, zod4(qualificationSchema), {
		errors: false
	});
	return { welder: { id: w.id, name: w.name, stamp: w.stamp }, form };
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireRole(event, ...MANAGE_ROLES);
		const data = await postedForm(event.request);
		const form = await superValidate(data, zod4(qualificationSchema));
		if (!form.valid) return fail(400, { form });
		const file = data.get('record');
		let upload = null;
		if (file instanceof File && file.size > 0) {
			if (file.size > MAX_RECORD_BYTES)
				return setError(form, 'results', 'The test record is over 15 MB.');
			upload = { name: file.name, bytes: new Uint8Array(await file.arrayBuffer()) };
		}
		try {
			await addQualification(user, Number(event.params.id), form.data, upload, event);
		} catch (e) {
			// The record field is not in the schema: its refusal is the form's message.
			if (e instanceof RefusedError && e.field === 'record')
				return fail(400, { form, recordError: e.message });
			return refuseForm(form, e);
		}
		redirect(303, `/welders/${event.params.id}`);
	}
};
