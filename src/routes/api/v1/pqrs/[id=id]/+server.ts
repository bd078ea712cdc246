import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { AUTHOR_ROLES, VIEW_ROLES } from '$lib/server/procedures';
import { attempt } from '$lib/server/procedures/api-errors';
import { getPqr, updatePqr } from '$lib/server/pqrs';
import { pqrFormSchema } from '$lib/schemas/pqr';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...VIEW_ROLES);
	return json(await attempt(() => getPqr(user, Number(event.params.id), event)));
});

/** Replaces a draft PQR's values and tests; a certified one answers 409 (add an addendum). */
export const PUT: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...AUTHOR_ROLES);
	const id = Number(event.params.id);
	const input = await readBody(event, pqrFormSchema);
	await attempt(() => updatePqr(user, id, input, event));
	return json(await attempt(() => getPqr(user, id, event)));
});
