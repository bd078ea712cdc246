import { error } from '@sveltejs/kit';
import { requireMember } from '$lib/server/auth/guards';
import { cardResponse } from '$lib/server/welders/card-response';
import { welderOfUser } from '$lib/server/welders/welders';
import type { RequestHandler } from './$types';

// A welder prints their own card.
export const GET: RequestHandler = async (event) => {
	const user = requireMember(event);
	const w = await welderOfUser(user);
	if (!w) error(404, { message: 'Your account is not linked to a welder.' });
	return cardResponse(event, user, w.id);
};
