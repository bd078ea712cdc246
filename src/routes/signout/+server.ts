import { redirect } from '@sveltejs/kit';
import { authSignOut } from '$lib/server/auth/auth-js';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = () => redirect(303, '/');

// A form post (SvelteKit's origin check covers it); Auth.js clears the cookie and redirects.
export const POST: RequestHandler = async (event) => {
	const headers = new Headers(event.request.headers);
	headers.delete('content-length');
	headers.set('content-type', 'application/x-www-form-urlencoded');
	const body = new URLSearchParams({ redirectTo: '/signin' });
	const request = new Request(event.request.url, { method: 'POST', headers, body });
	await authSignOut({ ...event, request });
	redirect(303, '/signin');
};
