// Reading the Auth.js session cookie without running Auth.js. Its `auth()` replays a whole
// session request per call: a fresh key derivation and decryption, a re-encrypted cookie and a
// callback-url cookie on every response. A page only needs who the token names, so the cookie is
// decoded here, once per distinct token; whether that member may still act is decided by the
// database on every request (member-cache.ts), never by this cache.
import type { Cookies } from '@sveltejs/kit';
import { decode } from '@auth/core/jwt';
import { authSecret } from './secret';

/** Auth.js names the cookie after the scheme; the name is also the key derivation's salt. */
export const SESSION_COOKIES = ['__Secure-authjs.session-token', 'authjs.session-token'];

export interface SessionClaims {
	uid: string;
	sv: number;
	/** Expiry, seconds since the epoch, as the token carries it. */
	exp: number;
}

/** A token decodes to the same claims every time: cache by its text, bounded, expiry kept. */
const MAX_TOKENS = 5_000;
const decoded = new Map<string, SessionClaims | null>();

/** The cookie's value; Auth.js splits a long token over `name.0`, `name.1`, … */
function cookieValue(cookies: Cookies, name: string): string | undefined {
	const whole = cookies.get(name);
	if (whole) return whole;
	const parts: string[] = [];
	for (let i = 0; ; i++) {
		const part = cookies.get(`${name}.${i}`);
		if (!part) break;
		parts.push(part);
	}
	return parts.length ? parts.join('') : undefined;
}

async function decodeToken(token: string, salt: string): Promise<SessionClaims | null> {
	try {
		const p = await decode({ token, secret: authSecret(), salt });
		if (!p || typeof p.sub !== 'string' || typeof p.sv !== 'number' || typeof p.exp !== 'number')
			return null;
		return { uid: p.sub, sv: p.sv, exp: p.exp };
	} catch {
		// Tampered, expired or made with another secret: signed out, like Auth.js itself.
		return null;
	}
}

/** The claims of the request's session cookie, or null when there is none or it is not valid. */
export async function sessionClaims(cookies: Cookies): Promise<SessionClaims | null> {
	for (const name of SESSION_COOKIES) {
		const token = cookieValue(cookies, name);
		if (!token) continue;
		const key = `${name}\n${token}`;
		let claims = decoded.get(key);
		if (claims === undefined) {
			claims = await decodeToken(token, name);
			if (decoded.size >= MAX_TOKENS) decoded.delete(decoded.keys().next().value!);
			decoded.set(key, claims);
		}
		if (claims && claims.exp * 1000 <= Date.now()) return null;
		return claims;
	}
	return null;
}
