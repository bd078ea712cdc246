import { superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import { AUTHOR_ROLES, nextNumber } from '$lib/server/procedures';
import { createPqr } from '$lib/server/pqrs';
import { pqrFormSchema } from '$lib/schemas/pqr';
import { pqrCodeFor } from '$lib/procedures/default-code';
import { shopDefaultCode } from '$lib/server/people/shop-settings';
import type { Actions, PageServerLoad } from './$types';
import { saveThenShow } from '$lib/server/procedures/save-form';

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
		return saveThenShow(event, schema, async (data) => {
			const { id } = await createPqr(user, data, event);
			return `/pqrs/${id}?done=saved`;
		});
	}
};
