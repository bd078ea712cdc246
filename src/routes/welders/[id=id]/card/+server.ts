import { requireRole } from '$lib/server/auth/guards';
import { MANAGE_ROLES } from '$lib/server/welders/access';
import { cardResponse } from '$lib/server/welders/card-response';
import type { RequestHandler } from './$types';

// Printing a card issues the welder's verification link if there is none: engineers and admins.
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, ...MANAGE_ROLES);
	return cardResponse(event, user, Number(event.params.id));
};
