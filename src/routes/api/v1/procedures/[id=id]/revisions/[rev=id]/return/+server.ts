import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { returnRevision, REVIEW_ROLES } from '$lib/server/procedures';
import { attempt } from '$lib/server/procedures/api-errors';
import { returnSchema } from '$lib/schemas/procedure';
import type { RequestHandler } from './$types';

/** Returns a revision to draft; the comment is required. Decided already → 409. */
export const POST: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...REVIEW_ROLES);
	const input = await readBody(event, returnSchema);
	const { mailed } = await attempt(() =>
		returnRevision(user, Number(event.params.id), Number(event.params.rev), input, event)
	);
	return json({ state: 'draft', mailed });
});
