import { error, redirect, type RequestEvent } from '@sveltejs/kit';
import type { Role } from '$lib/roles';
import type { SessionUser } from './session-user';

// Every load, action and endpoint calls one of these itself: a layout load protects nothing.

/** For pages and actions: signed out goes to sign-in and comes back. */
export function requireMember(event: RequestEvent): SessionUser {
	const user = event.locals.user;
	if (!user) {
		const back = event.url.pathname + event.url.search;
		redirect(303, `/signin?redirectTo=${encodeURIComponent(back)}`);
	}
	return user;
}

/** For pages and actions that need one of the given roles; any other member gets 403. */
export function requireRole(event: RequestEvent, ...roles: Role[]): SessionUser {
	const user = requireMember(event);
	if (!roles.includes(user.role))
		error(403, { message: 'Your role does not give access to this page.' });
	return user;
}
