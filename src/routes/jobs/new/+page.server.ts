import { redirect } from '@sveltejs/kit';
import { fail, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import { createJob, JOB_AUTHOR_ROLES } from '$lib/server/fabrication';
import { postedForm } from '$lib/server/forms/posted-form';
import { refuseForm } from '$lib/server/people/form-errors';
import { Shop } from '$lib/server/models';
import { CODES, type CodeId } from '$lib/procedures/options';
import { jobSchema } from '$lib/schemas/job';
import type { Actions, PageServerLoad } from './$types';

const schema = zod4(jobSchema);

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...JOB_AUTHOR_ROLES);
	const shop = await Shop.findByPk(user.shopId);
	const asked = shop?.defaultCode ?? '';
	const code: CodeId = (CODES as readonly string[]).includes(asked) ? (asked as CodeId) : 'asme-ix';
	return { form: await superValidate({ code }, schema, { errors: false }) };
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireRole(event, ...JOB_AUTHOR_ROLES);
		const form = await superValidate(await postedForm(event.request), schema);
		if (!form.valid) return fail(400, { form });
		let id: number;
		try {
			({ id } = await createJob(user, form.data, event));
		} catch (e) {
			return refuseForm(form, e);
		}
		redirect(303, `/jobs/${id}?created=1`);
	}
};
