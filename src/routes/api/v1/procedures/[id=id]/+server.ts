import { json } from '@sveltejs/kit';
import { api, apiMember } from '$lib/server/api/respond';
import { findProcedure, revisionsOf, VIEW_ROLES } from '$lib/server/procedures';
import { attempt } from '$lib/server/procedures/api-errors';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...VIEW_ROLES);
	const id = Number(event.params.id);
	const [p, revisions] = await attempt(() =>
		Promise.all([findProcedure(user, id), revisionsOf(user, id)])
	);
	return json({
		id: p.id,
		number: p.number,
		title: p.title,
		code: p.code,
		process: p.process,
		baseMetalFamily: p.baseMetalFamily,
		state: p.state,
		headRev: p.headRev,
		approvedRev: p.approvedRev ?? null,
		revisions
	});
});
