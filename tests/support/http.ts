// Plain HTTP against the shared end-to-end server, for the tests that send requests rather than
// click: its origin, a signed-in cookie per person, and its database file (read-only checks).
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { signInCookie } from '../../scripts/bench/http';
import { openSqlite, type SqliteFile } from '../../scripts/lib/sqlite-file';

export const origin = () => `http://localhost:${process.env.E2E_PORT}`;

const cookies = new Map<string, Promise<string>>();

/**
 * One sign-in per person for the whole run: the session cookie, as a browser would send it,
 * kept in the run's data folder so restarted workers do not spend the per-e-mail sign-in limit.
 */
export function cookieOf(who: { email: string; password: string }): Promise<string> {
	let c = cookies.get(who.email);
	if (!c) {
		const file = join(process.env.E2E_DATA_DIR ?? '', `cookie-${who.email}`);
		c = existsSync(file)
			? Promise.resolve(readFileSync(file, 'utf8'))
			: signInCookie(origin(), who.email, who.password).then((v) => {
					writeFileSync(file, v);
					return v;
				});
		cookies.set(who.email, c);
	}
	return c;
}

export function postJson(path: string, cookie: string, body: unknown): Promise<Response> {
	return fetch(origin() + path, {
		method: 'POST',
		redirect: 'manual',
		headers: { cookie, origin: origin(), 'content-type': 'application/json' },
		body: JSON.stringify(body)
	});
}

/** A form post as a browser sends it without JavaScript (so SvelteKit answers with HTML). */
export function postForm(
	path: string,
	cookie: string,
	fields: Record<string, string> | FormData
): Promise<Response> {
	const body = fields instanceof FormData ? fields : new URLSearchParams(fields);
	return fetch(origin() + path, {
		method: 'POST',
		redirect: 'manual',
		headers: { cookie, origin: origin(), accept: 'text/html' },
		body
	});
}

export async function withE2eDatabase<T>(work: (db: SqliteFile) => Promise<T>): Promise<T> {
	const db = await openSqlite(join(process.env.E2E_DATA_DIR ?? '', 'beadline.sqlite'), {
		readonly: true
	});
	try {
		return await work(db);
	} finally {
		await db.close();
	}
}
