import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { AUTHOR_ROLES, withdrawRevision } from '$lib/server/procedures';
import { attempt } from '$lib/server/procedures/api-errors';
import { withdrawSchema } from '$lib/schemas/procedure';
import type { RequestHandler } from './$types';

export const POST: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...AUTHOR_ROLES);
	const { reason } = await readBody(event, withdrawSchema);
	await attempt(() =>
		withdrawRevision(user, Number(event.params.id), Number(event.params.rev), reason, event)
	);
	return json({ state: 'withdrawn' });
});
