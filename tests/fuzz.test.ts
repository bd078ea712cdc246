// Fuzzing every form action and every data-changing JSON API found in src/routes with fast-check:
// malformed, oversize and hostile payloads (wrong types, huge strings, unicode, injection strings,
// prototype-pollution keys), shaped by the route's zod schema where one is known. Each answer:
// no 5xx; a 400 carries field errors; a refused request (4xx) commits nothing to the database
// (SQLite's data_version, read on a connection of our own, must not move, or else only rows
// added to the append-only audit trail, as a refused signature is meant to leave).
// FUZZ_RUNS payloads per route (default 20), FUZZ_SEED to replay (printed).
import { expect, test } from '@playwright/test';
import fc from 'fast-check';
import type { z } from 'zod';
import { signInCookie } from '../scripts/bench/http';
import { tableSummaries, type TableSummary } from '../scripts/lib/backup';
import { openSqlite, type SqliteFile } from '../scripts/lib/sqlite-file';
import {
	checksBodySchema,
	pqrRangesBodySchema,
	welderPositionsBodySchema
} from '../src/lib/schemas/checks';
import { addendumSchema, pqrFormSchema } from '../src/lib/schemas/pqr';
import {
	approveSchema,
	newProcedureSchema,
	returnSchema,
	revisionFormSchema,
	withdrawSchema
} from '../src/lib/schemas/procedure';
import { settingsRecordSchema } from '../src/lib/schemas/settings-record';
import { continuitySchema, qualificationSchema, welderApiSchema } from '../src/lib/schemas/welder';
import { demoParams, type Params } from './support/demo-params';
import { makeFixtures } from './support/fixtures';
import { formFields, fromSchema, hostileJson } from './support/hostile';
import { ownServer, type OwnServer } from './support/own-server';
import { admin, engineer, inspector, welder } from './support/people';
import { discoverRoutes, fillPath, type AppRoute } from './support/routes';

const RUNS = Number(process.env.FUZZ_RUNS ?? 20);
const SEED = Number(process.env.FUZZ_SEED ?? Date.now() % 1_000_000);

/** The zod schema each JSON API validates with (routes not listed get generic hostile JSON). */
const API_SCHEMAS: Record<string, z.ZodType> = {
	'POST /api/v1/checks': checksBodySchema,
	'POST /api/v1/checks/pqr-ranges': pqrRangesBodySchema,
	'POST /api/v1/checks/welder-positions': welderPositionsBodySchema,
	'POST /api/v1/settings': settingsRecordSchema,
	'PATCH /api/v1/settings/[id=id]': settingsRecordSchema,
	'POST /api/v1/procedures': newProcedureSchema,
	'PUT /api/v1/procedures/[id=id]/revisions/[rev=id]': revisionFormSchema,
	'POST /api/v1/procedures/[id=id]/revisions/[rev=id]/approve': approveSchema,
	'POST /api/v1/procedures/[id=id]/revisions/[rev=id]/return': returnSchema,
	'POST /api/v1/procedures/[id=id]/revisions/[rev=id]/withdraw': withdrawSchema,
	'POST /api/v1/pqrs': pqrFormSchema,
	'PUT /api/v1/pqrs/[id=id]': pqrFormSchema,
	'POST /api/v1/pqrs/[id=id]/addenda': addendumSchema,
	'POST /api/v1/welders': welderApiSchema,
	'POST /api/v1/welders/[id=id]/continuity': continuitySchema,
	'POST /api/v1/welders/[id=id]/qualifications': qualificationSchema
};

/** Ends the very sessions the fuzzer signs in with; their own tests cover them. */
const SKIP = new Set([
	'POST /signout',
	'POST /profile?/signOutEverywhere',
	'POST /admin/people/[id=uuid]?/signOutEverywhere'
]);

const targets = discoverRoutes().filter(
	(r) =>
		!SKIP.has(r.key) &&
		(r.kind === 'action' ||
			(r.kind === 'endpoint' &&
				r.pattern.startsWith('/api/') &&
				r.method !== 'GET' &&
				r.method !== 'HEAD'))
);

let server: OwnServer;
let db: SqliteFile;
let paramsFor: (pattern: string) => Params;
const people = { admin, engineer, inspector, welder };
const cookies: Record<string, string> = { anonymous: '' };
const totals = { requests: 0, refused: 0, accepted: 0, routes: 0, retried: 0, audited: 0 };

test.beforeAll(async () => {
	test.setTimeout(180_000);
	server = await ownServer();
	await server.start();
	for (const [role, p] of Object.entries(people))
		cookies[role] = await signInCookie(server.origin, p.email, p.password);
	await makeFixtures(server.origin, cookies.engineer!, server.databaseFile);
	paramsFor = await demoParams(server.databaseFile);
	db = await openSqlite(server.databaseFile, { readonly: true });
});

test.afterAll(async () => {
	await db?.close();
	await server?.dispose();
	console.log(
		`[fuzz] ${totals.routes} routes, ${totals.requests} hostile requests (FUZZ_RUNS=${RUNS}, FUZZ_SEED=${SEED}): ` +
			`${totals.refused} refused with 4xx and nothing stored (${totals.audited} of them recorded in the audit trail), ${totals.accepted} accepted, 0 server errors (${totals.retried} resent after a reset socket)`
	);
});

const dataVersion = async () =>
	Number((await db.get<{ data_version: number }>('PRAGMA data_version'))!.data_version);

/** Every table's digest as of a data_version, retaken only when something was committed. */
let snapshot: { version: number; tables: Record<string, TableSummary> } | undefined;
async function current() {
	const version = await dataVersion();
	if (snapshot?.version !== version) snapshot = { version, tables: await tableSummaries(db) };
	return snapshot;
}

/** Logs a refusal may append to: the audit trail (a refused signature is recorded on purpose)
 * and the taps received from phones (a refused tap is kept, so its retry gets the same answer). */
const APPEND_ONLY_LOGS = ['audit_events', 'continuity_taps'];
/** Counts a refusal may move: the booth view's lookup log (a page shown again after a refused
 * tap is a lookup, counted in its window's row) and the rate and failed-sign-in counters. */
const COUNTERS = ['booth_lookups', 'window_counters'];

/** What a refused request committed beyond those logs: the names of the tables it changed. */
async function changedBy(before: NonNullable<typeof snapshot>): Promise<string[]> {
	const after = await current();
	if (after.version === before.version) return [];
	totals.audited++;
	return Object.keys({ ...before.tables, ...after.tables }).filter((t) => {
		const [b, a] = [before.tables[t], after.tables[t]];
		if (b?.sha256 === a?.sha256) return false;
		if (COUNTERS.includes(t)) return false;
		return !(APPEND_ONLY_LOGS.includes(t) && b && a && a.rows > b.rows);
	});
}

interface Sent {
	status: number;
	body: string;
}

async function send(
	route: AppRoute,
	path: string,
	cookie: string,
	payload: Payload
): Promise<Sent> {
	const headers: Record<string, string> = { origin: server.origin };
	if (cookie) headers.cookie = cookie;
	let body: BodyInit;
	if (payload.kind === 'form') {
		// As enhanced forms send it (JSON answer with the real status), or as a plain browser post.
		headers.accept = payload.html ? 'text/html' : 'application/json';
		if (!payload.html) headers['x-sveltekit-action'] = 'true';
		const form = new FormData();
		for (const [k, v] of payload.fields) form.append(k, v);
		if (payload.file)
			form.append(
				payload.file,
				new Blob([Buffer.from(payload.fields.flat().join())]),
				'../../x.png'
			);
		body = payload.urlencoded ? new URLSearchParams(payload.fields) : form;
		if (payload.broken) {
			headers['content-type'] = 'multipart/form-data; boundary=never-sent';
			body = payload.fields.flat().join('&') || 'not multipart';
		}
	} else {
		headers['content-type'] = payload.contentType;
		body = payload.text;
	}
	const init: RequestInit = { method: route.method, headers, body, redirect: 'manual' };
	// A route that answers before reading a big body leaves its socket to be closed under the
	// next request on it (ECONNRESET in undici): that is the transport, not an answer, so retry.
	const res = await fetch(server.origin + path, init).catch(async () => {
		totals.retried++;
		await new Promise((r) => setTimeout(r, 100));
		return fetch(server.origin + path, init);
	});
	const text = await res.text();
	let status = res.status;
	// An enhanced action answers 200 with the action's own status inside.
	if (payload.kind === 'form' && !payload.html && status === 200) {
		const r = JSON.parse(text) as { type: string; status?: number };
		status = r.status ?? (r.type === 'success' ? 200 : status);
	}
	return { status, body: text };
}

type Payload =
	| {
			kind: 'form';
			fields: [string, string][];
			html: boolean;
			urlencoded: boolean;
			file?: string;
			/** Claims multipart but is not: a broken client or a hand-made request. */
			broken?: boolean;
	  }
	| { kind: 'json'; text: string; contentType: string };

function payloads(route: AppRoute, names: string[]): fc.Arbitrary<Payload> {
	if (route.kind === 'action')
		return fc
			.record({
				fields: formFields(names),
				html: fc.boolean(),
				urlencoded: fc.boolean(),
				file: fc.option(fc.constantFrom(...(names.length ? names : ['file'])), { nil: undefined }),
				broken: fc.integer({ min: 0, max: 9 }).map((n) => n === 0) // one in ten
			})
			.map((p) => ({ kind: 'form' as const, ...p }));
	const shaped = API_SCHEMAS[route.key] ? fromSchema(API_SCHEMAS[route.key]!) : hostileJson;
	return fc.oneof(
		{
			weight: 8,
			arbitrary: shaped.map((v) => ({
				kind: 'json' as const,
				text: JSON.stringify(v) ?? 'null',
				contentType: 'application/json'
			}))
		},
		{
			weight: 1,
			arbitrary: fc
				.constantFrom(
					'{"__proto__":{"polluted":true},"constructor":{"prototype":{"polluted":true}}}',
					'{"process":',
					'[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]',
					'',
					'\u0000'
				)
				.map((text) => ({ kind: 'json' as const, text, contentType: 'application/json' }))
		},
		{
			weight: 1,
			arbitrary: fc.constant({
				kind: 'json' as const,
				text: 'process=GTAW',
				contentType: 'text/plain'
			})
		}
	);
}

const refusedAccess = (s: Sent) => s.status === 401 || s.status === 403 || s.status === 404;

/** The first person the route lets in (an empty request is not refused for them). */
async function actorFor(route: AppRoute, path: string): Promise<string> {
	for (const who of ['engineer', 'admin', 'inspector', 'welder', 'anonymous']) {
		const probe = await send(
			route,
			path,
			cookies[who]!,
			route.kind === 'action'
				? { kind: 'form', fields: [], html: false, urlencoded: true }
				: { kind: 'json', text: '{}', contentType: 'application/json' }
		);
		const toSignIn = probe.status === 303 && /\/signin/.test(probe.body);
		if (!refusedAccess(probe) && !toSignIn) return who;
	}
	return 'engineer';
}

for (const route of targets) {
	test(`fuzz ${route.key}`, async () => {
		test.setTimeout(120_000 + RUNS * 2_000);
		const path =
			fillPath(route.pattern, paramsFor(route.pattern)) +
			(route.action && route.action !== 'default' ? `?/${route.action}` : '');
		const who = await actorFor(route, path);
		// Field names from the page's own form, for actions; the fuzzer adds strangers to them.
		const page =
			route.kind === 'action'
				? await fetch(server.origin + path.replace(/\?.*$/, ''), {
						headers: { cookie: cookies[who]! }
					}).then((r) => r.text())
				: '';
		const names = [...new Set([...page.matchAll(/name="([^"]+)"/g)].map((m) => m[1]!))];
		const check = async (p: Payload) => {
			const before = await current();
			const sent = await send(route, path, cookies[who]!, p);
			totals.requests++;
			const label = `${route.key} as ${who} → ${sent.status}: ${sent.body.slice(0, 300)}`;
			expect(sent.status, label).toBeLessThan(500);
			if (sent.status >= 400) {
				totals.refused++;
				expect(await changedBy(before), `${label}\na refused request changed these tables`).toEqual(
					[]
				);
				if (sent.status === 400 && p.kind === 'json')
					expect(sent.body, label).toMatch(/"(errors|message)"/);
			} else {
				totals.accepted++;
				await current();
			}
		};
		const run = await fc.check(fc.asyncProperty(payloads(route, names), check), {
			numRuns: RUNS,
			seed: SEED,
			endOnFailure: true
		});
		// fast-check's own report quotes the whole payload (megabytes); a short one is enough.
		if (run.failed)
			throw new Error(
				`${route.key}: ${String(run.errorInstance ?? '').slice(0, 1500)}\npayload: ${JSON.stringify(run.counterexample).slice(0, 600)}…`
			);
		// Once per route: a body of some megabytes in one field.
		await check(
			route.kind === 'action'
				? {
						kind: 'form',
						fields: [[names[0] ?? 'x', 'A'.repeat(3_000_000)]],
						html: false,
						urlencoded: false
					}
				: {
						kind: 'json',
						text: JSON.stringify({ process: 'A'.repeat(3_000_000) }),
						contentType: 'application/json'
					}
		);
		totals.routes++;
	});
}
