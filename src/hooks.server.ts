import type { Handle, HandleServerError, RequestEvent, ServerInit } from '@sveltejs/kit';
import { currentMember } from '$lib/server/auth/current-member';
import { MEMBER_HEADER, memberKey } from '$lib/server/auth/member-key';
import { exitOnConfigError, migrate } from '$lib/server/db';
import { publicError } from '$lib/server/public-error';
import { sweepUploads } from '$lib/server/maintenance/upload-sweep';
import { orExit } from '$lib/server/config-error';
import { checkStorage } from '$lib/server/storage/select';
import { startJobTimers } from '$lib/server/jobs/timer';
import { closeOnShutdown } from '$lib/server/shutdown';
import { building } from '$app/environment';

export const init: ServerInit = async () => {
	// A bad DATABASE_URL or an unreachable database stops start-up with one sentence, no stack.
	await migrate().catch(exitOnConfigError);
	// A bucket that is missing or refuses the credentials stops start-up with one sentence.
	if (!building) await orExit(checkStorage);
	// After a crash: unfinished and unreferenced uploads move aside before any request is served.
	if (!building) await sweepUploads(new Date(Date.now() - process.uptime() * 1000));
	// The hourly lapse-notice run; never while building (BEADLINE_JOBS=off leaves it to cron).
	if (!building) startJobTimers();
	if (!building) closeOnShutdown();
};

/** Every answer's security headers, set on the way out. */
function secure(event: RequestEvent, response: Response): Response {
	const h = response.headers;
	h.set('X-Content-Type-Options', 'nosniff');
	h.set('Referrer-Policy', 'same-origin');
	h.set('X-Frame-Options', 'DENY');
	h.set('Permissions-Policy', 'camera=(self), microphone=(), geolocation=()');
	h.set('Cross-Origin-Opener-Policy', 'same-origin');
	if (!h.has('Content-Security-Policy') && !event.url.pathname.startsWith('/_app/')) {
		// Endpoints and error pages get a locked-down policy too; pages get Kit's nonce-based one.
		h.set('Content-Security-Policy', "default-src 'none'; frame-ancestors 'none'");
	}
	return response;
}

/** The four Latin faces (WOFF2 only) are in every first paint; loading them late shifts the layout. */
const FIRST_PAINT_FONTS =
	/atkinson-hyperlegible-(next|mono)-latin-(400|700)-normal\.[\w-]+\.woff2$/;

/** Requests no session can change: health, Kit's static files, and API calls with a token. */
function sessionless(event: RequestEvent): boolean {
	const path = event.url.pathname;
	if (path === '/api/v1/health' || path.startsWith('/_app/')) return true;
	return path.startsWith('/api/') && event.request.headers.has('authorization');
}

const member: Handle = async ({ event, resolve }) => {
	event.locals.user = sessionless(event) ? null : await currentMember(event);
	const response = await resolve(event, {
		preload: ({ type, path }) =>
			type === 'js' || type === 'css' || (type === 'font' && FIRST_PAINT_FONTS.test(path))
	});
	// A signed-in page must never come back from a shared cache or the back button of another person.
	if (event.locals.user && !response.headers.has('Cache-Control')) {
		response.headers.set('Cache-Control', 'private, no-store');
	}
	// Tells the service worker whose pages it may keep on this phone (none when signed out).
	if (event.locals.user) response.headers.set(MEMBER_HEADER, memberKey(event.locals.user.id));
	return response;
};

/**
 * Security headers around Auth.js around the member look-up, as one handle: Kit's `sequence`
 * wraps each step in a traced span and a request store of its own, which on the health route
 * cost more than the steps. Auth.js itself runs only where a session begins or ends: its own
 * routes under /auth (the e-mail link's callback, sign-out, its CSRF token); the sign-in and
 * sign-out actions call it directly.
 */
export const handle: Handle = async ({ event, resolve }) => {
	if (!event.url.pathname.startsWith('/auth/'))
		return secure(event, await member({ event, resolve }));
	// Loaded at the first such request: a process that only serves pages never holds Auth.js.
	const { authHandle } = await import('$lib/server/auth/auth-js');
	const response = await authHandle({
		event,
		resolve: (e, outer) =>
			member({ event: e, resolve: (e2, own) => resolve(e2, { ...outer, ...own }) })
	});
	return secure(event, response);
};

export const handleError: HandleServerError = ({ error, status, message }) =>
	publicError(error, status, message);
