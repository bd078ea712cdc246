import type { Handle, HandleServerError, ServerInit } from '@sveltejs/kit';
import { sequence } from '@sveltejs/kit/hooks';
import { authHandle } from '$lib/server/auth/auth-js';
import { currentMember } from '$lib/server/auth/current-member';
import { exitOnConfigError, migrate } from '$lib/server/db';
import { publicError } from '$lib/server/public-error';
import { sweepUploads } from '$lib/server/maintenance/upload-sweep';
import { orExit } from '$lib/server/config-error';
import { checkStorage } from '$lib/server/storage/select';
import { startJobTimers } from '$lib/server/jobs/timer';
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
};

const securityHeaders: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
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
};

/** The four Latin faces (WOFF2 only) are in every first paint; loading them late shifts the layout. */
const FIRST_PAINT_FONTS =
	/atkinson-hyperlegible-(next|mono)-latin-(400|700)-normal\.[\w-]+\.woff2$/;

const member: Handle = async ({ event, resolve }) => {
	event.locals.user = await currentMember(event);
	const response = await resolve(event, {
		preload: ({ type, path }) =>
			type === 'js' || type === 'css' || (type === 'font' && FIRST_PAINT_FONTS.test(path))
	});
	// A signed-in page must never come back from a shared cache or the back button of another person.
	if (event.locals.user && !response.headers.has('Cache-Control')) {
		response.headers.set('Cache-Control', 'private, no-store');
	}
	return response;
};

export const handle = sequence(securityHeaders, authHandle, member);

export const handleError: HandleServerError = ({ error, status, message }) =>
	publicError(error, status, message);
