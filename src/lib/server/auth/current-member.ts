import type { RequestEvent } from '@sveltejs/kit';
import { memberFor } from './member-cache';
import { SESSION_COOKIES, sessionClaims } from './session-token';
import type { SessionUser } from './session-user';

/**
 * The member behind the session cookie, checked against the database on every request: a
 * disabled member, or a token older than the member's session version ("sign out everywhere"),
 * is signed out right here. Nothing else sets a cookie, so answers to a signed-in member's
 * ordinary requests carry no Set-Cookie.
 */
export async function currentMember(event: RequestEvent): Promise<SessionUser | null> {
	const claims = await sessionClaims(event.cookies);
	const member = claims && (await memberFor(claims.uid, claims.sv));
	if (!member) {
		// A dead or unreadable token is cleared; a request that brought none gets no cookie.
		for (const name of SESSION_COOKIES)
			if (event.cookies.get(name)) event.cookies.delete(name, { path: '/' });
	}
	return member ?? null;
}
