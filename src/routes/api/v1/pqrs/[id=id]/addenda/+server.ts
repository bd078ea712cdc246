import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { AUTHOR_ROLES } from '$lib/server/procedures';
import { attempt } from '$lib/server/procedures/api-errors';
import { addAddendum } from '$lib/server/pqrs';
import { addendumSchema } from '$lib/schemas/pqr';
import type { RequestHandler } from './$types';

export const POST: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...AUTHOR_ROLES);
	const { body } = await readBody(event, addendumSchema);
	const { id } = await attempt(() => addAddendum(user, Number(event.params.id), body, event));
	return json({ id }, { status: 201 });
});
