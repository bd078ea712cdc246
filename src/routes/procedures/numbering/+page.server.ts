import { fail, message, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import { patternsOf, setPatterns } from '$lib/server/procedures';
import { applyPattern } from '$lib/server/procedures/numbering';
import { refuse } from '$lib/server/procedures/form-errors';
import { numberingSchema } from '$lib/schemas/procedure';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

const schema = zod4(numberingSchema);

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'admin');
	const patterns = await patternsOf(user.shopId);
	return {
		form: await superValidate(patterns, schema, { errors: false }),
		examples: {
			wps: applyPattern(patterns.wpsPattern, 7, 'GTAW'),
			pqr: applyPattern(patterns.pqrPattern, 7, 'GTAW')
		}
	};
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireRole(event, 'admin');
		const form = await superValidate(await postedForm(event.request), schema);
		if (!form.valid) return fail(400, { form });
		try {
			await setPatterns(user, form.data, event);
		} catch (e) {
			return refuse(form, e);
		}
		return message(form, 'Saved. New procedures and PQRs are numbered this way.');
	}
};
