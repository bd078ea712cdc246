// Helpers for the offline journeys: a server of their own (the taps they count must not meet
// another test's taps of the same welder, process and day), a phone context on it, and reads of
// its database.
import { devices, expect, type Browser, type Page } from '@playwright/test';
import { openSqlite } from '../../scripts/lib/sqlite-file';
import type { OwnServer } from './own-server';

export async function phone(browser: Browser, server: OwnServer) {
	const context = await browser.newContext({ ...devices['Pixel 7'], baseURL: server.origin });
	const page = await context.newPage();
	return { context, page };
}

/** Waits until the service worker controls the page (it claims pages once it is active). */
export async function controlled(page: Page) {
	await page.waitForFunction(() => !!navigator.serviceWorker?.controller, null, {
		timeout: 20_000
	});
}

export async function query<T>(server: OwnServer, sql: string, params: unknown[] = []) {
	const db = await openSqlite(server.databaseFile, { readonly: true });
	try {
		return await db.all<T>(sql, params);
	} finally {
		await db.close();
	}
}

export async function boothTokenOn(server: OwnServer, number: string, rev: number) {
	const [row] = await query<{ token: string }>(
		server,
		`SELECT l.token FROM booth_links l
		 JOIN procedures p ON p.id = l.procedure_id
		 JOIN procedure_revisions r ON r.id = l.revision_id
		 WHERE p.number = ? AND r.rev = ? AND l.revoked_at IS NULL
		 ORDER BY l.id DESC LIMIT 1`,
		[number, rev]
	);
	expect(row, `a live booth link for ${number} rev ${rev}`).toBeTruthy();
	return row!.token;
}

/** The continuity entries of the welder signed in as `email` for a process (all days). */
export async function entriesOf(server: OwnServer, email: string, process: string) {
	return query<{ used_on: string }>(
		server,
		`SELECT c.used_on FROM continuity_entries c
		 JOIN welders w ON w.id = c.welder_id JOIN users u ON u.id = w.user_id
		 WHERE u.email = ? AND c.process = ?`,
		[email, process]
	);
}

/** Polls until `read` gives what `ok` wants, within a bounded time (no fixed sleeps). */
export async function eventually<T>(read: () => Promise<T>, ok: (v: T) => boolean, ms = 15_000) {
	const until = Date.now() + ms;
	let v = await read();
	while (!ok(v) && Date.now() < until) {
		await new Promise((r) => setTimeout(r, 200));
		v = await read();
	}
	return v;
}
