import { json, type RequestEvent } from '@sveltejs/kit';
import type { z } from 'zod';
import type { Role } from '$lib/roles';
import type { SessionUser } from '../auth/session-user';
import { config } from '../config';
import { memberForToken } from './api-tokens';

/** Thrown from API handlers as a JSON answer (SvelteKit turns `error()` into one too). */
function fail(status: number, body: Record<string, unknown>): never {
	throw new ApiFailure(status, body);
}

export class ApiFailure extends Error {
	constructor(
		readonly status: number,
		readonly body: Record<string, unknown>
	) {
		super(String(body.message ?? status));
	}
}

/** The configured origin, parsed once per distinct value rather than on every API call. */
let parsedOrigin: { from: string; origin: string } | null = null;
function appOrigin(): string {
	const from = config.origin;
	if (parsedOrigin?.from !== from) parsedOrigin = { from, origin: new URL(from).origin };
	return parsedOrigin.origin;
}

/**
 * The caller of an API endpoint: a bearer token, or the session cookie. A cookie alone can be
 * ridden by another site, so a data-changing call on a cookie must be same-origin JSON.
 */
export async function apiMember(event: RequestEvent, ...roles: Role[]): Promise<SessionUser> {
	const header = event.request.headers.get('authorization');
	let user: SessionUser | null = null;
	if (header) {
		const match = /^Bearer\s+(\S+)$/i.exec(header);
		user = match?.[1] ? await memberForToken(match[1]) : null;
		if (!user) fail(401, { message: 'The API token is unknown or revoked.' });
	} else {
		user = event.locals.user;
		if (!user) fail(401, { message: 'Sign in or send an API token (Authorization: Bearer …).' });
		if (event.request.method !== 'GET' && event.request.method !== 'HEAD') {
			const origin = event.request.headers.get('origin');
			if (origin && origin !== appOrigin() && origin !== event.url.origin) {
				fail(403, { message: 'Cross-site requests are refused.' });
			}
		}
	}
	if (roles.length && !roles.includes(user.role)) {
		fail(403, { message: 'Your role does not allow this.' });
	}
	return user;
}

/**
 * Reads a JSON body and validates it. A body that is not JSON, or not sent as JSON, is a 400 with
 * `{ errors }` like any other bad input: the API contract answers bad input that way only.
 */
export async function readBody<S extends z.ZodType>(
	event: RequestEvent,
	schema: S
): Promise<z.output<S>> {
	const type = event.request.headers.get('content-type') ?? '';
	if (!type.toLowerCase().startsWith('application/json')) {
		fail(400, {
			errors: { '': ['The body must be JSON, sent with content-type application/json.'] }
		});
	}
	let raw: unknown;
	try {
		raw = await event.request.json();
	} catch {
		fail(400, { errors: { '': ['The body is not valid JSON.'] } });
	}
	const parsed = schema.safeParse(raw);
	if (!parsed.success) fail(400, { errors: fieldErrors(parsed.error) });
	return parsed.data;
}

export function fieldErrors(err: z.ZodError): Record<string, string[]> {
	const out: Record<string, string[]> = {};
	for (const issue of err.issues) {
		const key = issue.path.map(String).join('.');
		(out[key] ??= []).push(issue.message);
	}
	return out;
}

/** Wraps a handler so ApiFailure becomes its JSON answer; anything else stays a logged 500. */
export function api<E extends RequestEvent>(handler: (event: E) => Promise<Response>) {
	return async (event: E): Promise<Response> => {
		try {
			return await handler(event);
		} catch (e) {
			if (e instanceof ApiFailure) return json(e.body, { status: e.status });
			throw e;
		}
	};
}
