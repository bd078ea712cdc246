import { superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import { AUTHOR_ROLES } from '$lib/server/procedures';
import { CERTIFIED_MESSAGE, findPqr, readPqr, updatePqr } from '$lib/server/pqrs';
import { rethrowAsHttp } from '$lib/server/procedures/form-errors';
import { pqrToForm } from '$lib/procedures/pqr-values';
import { pqrFormSchema } from '$lib/schemas/pqr';
import { asPqrCode } from '$lib/procedures/default-code';
import type { Actions, PageServerLoad } from './$types';
import { saveThenShow } from '$lib/server/procedures/save-form';

const schema = zod4(pqrFormSchema);

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...AUTHOR_ROLES);
	try {
		const p = await findPqr(user, Number(event.params.id));
		const head = { id: p.id, number: p.number };
		if (p.state !== 'draft') return { head, refused: CERTIFIED_MESSAGE, form: null };
		const { values, tests } = readPqr(p);
		const form = await superValidate(
			{
				...pqrToForm({ number: p.number, title: p.title, values, tests }, user.unitSystem),
				code: asPqrCode(p.code)
			},
			schema,
			{ errors: false }
		);
		return { head, refused: null, form };
	} catch (e) {
		rethrowAsHttp(e);
	}
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireRole(event, ...AUTHOR_ROLES);
		const id = Number(event.params.id);
		return saveThenShow(event, schema, async (data) => {
			await updatePqr(user, id, data, event);
			return `/pqrs/${id}?done=saved`;
		});
	}
};
