import { json } from '@sveltejs/kit';
import { api, apiMember } from '$lib/server/api/respond';
import { AUTHOR_ROLES, startRevision } from '$lib/server/procedures';
import { attempt } from '$lib/server/procedures/api-errors';
import type { RequestHandler } from './$types';

/** Starts a new revision as a copy of the newest one. */
export const POST: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...AUTHOR_ROLES);
	const id = Number(event.params.id);
	const { rev } = await attempt(() => startRevision(user, id, event));
	return json({ rev, href: `/api/v1/procedures/${id}/revisions/${rev}` }, { status: 201 });
});
