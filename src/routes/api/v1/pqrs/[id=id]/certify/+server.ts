import { json } from '@sveltejs/kit';
import { api, apiMember } from '$lib/server/api/respond';
import { CERTIFY_ROLES } from '$lib/server/procedures';
import { attempt } from '$lib/server/procedures/api-errors';
import { certifyPqr } from '$lib/server/pqrs';
import type { RequestHandler } from './$types';

export const POST: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...CERTIFY_ROLES);
	const { digest } = await attempt(() => certifyPqr(user, Number(event.params.id), event));
	return json({ state: 'certified', digest });
});
