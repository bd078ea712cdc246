import { json } from '@sveltejs/kit';
import { api, apiMember, ApiFailure, readBody } from '$lib/server/api/respond';
import { approveRevision, REVIEW_ROLES } from '$lib/server/procedures';
import { attempt } from '$lib/server/procedures/api-errors';
import { approveSchema } from '$lib/schemas/procedure';
import type { RequestHandler } from './$types';

/**
 * The inspector's signature. Needs the inspector's own session and password: an API token acts
 * for a machine, not a person, so it cannot sign. Decided already → 409.
 */
export const POST: RequestHandler = api(async (event) => {
	if (event.request.headers.get('authorization'))
		throw new ApiFailure(403, {
			message: 'An API token cannot sign; the inspector signs in person.'
		});
	const user = await apiMember(event, ...REVIEW_ROLES);
	const input = await readBody(event, approveSchema);
	const r = await attempt(() =>
		approveRevision(user, Number(event.params.id), Number(event.params.rev), input, event)
	);
	return json({ state: 'approved', signOffId: r.signOffId, digest: r.digest, mailed: r.mailed });
});
