import { json } from '@sveltejs/kit';
import { api, apiMember } from '$lib/server/api/respond';
import { AUTHOR_ROLES, submitRevision } from '$lib/server/procedures';
import { attempt } from '$lib/server/procedures/api-errors';
import type { RequestHandler } from './$types';

export const POST: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...AUTHOR_ROLES);
	const { mailed } = await attempt(() =>
		submitRevision(user, Number(event.params.id), Number(event.params.rev), event)
	);
	return json({ state: 'in-review', mailed });
});
