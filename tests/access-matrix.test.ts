// The access matrix: every route discovered in src/routes (pages, named form actions, endpoint
// methods) against each role of the demo shop, signed out, and a member of another shop, on a
// server of its own. Allowed cases work; every other case is refused (sign-in, 401, 403, 404)
// and carries nothing of the demo shop. Who may do what is in tests/support/access-rules.ts.
import { expect, test } from '@playwright/test';
import { signInCookie } from '../scripts/bench/http';
import type { Role } from '../src/lib/roles';
import { ACCESS_RULES, type Access } from './support/access-rules';
import { demoParams, type Params } from './support/demo-params';
import { makeFixtures } from './support/fixtures';
import { ownServer, type OwnServer } from './support/own-server';
import { admin, engineer, inspector, otherAdmin, person, welder } from './support/people';
import { discoverRoutes, fillPath, type AppRoute } from './support/routes';

const otherEngineer = person('colm@harrowgate.example');
type Who = Role | 'anonymous' | 'other';
const WHO: Who[] = ['admin', 'engineer', 'inspector', 'welder', 'anonymous', 'other'];
/** Anything that names the demo shop or its people must never reach an outsider. */
const MARKERS = /Larkspur|larkspur\.example|Okafor|Castell|Mirela Sand|Whitlow|Priya Venn/;

const routes = discoverRoutes();
let server: OwnServer;
let paramsFor: (pattern: string) => Params;
const cookies: Partial<Record<Role | 'otherAdmin' | 'otherEngineer', string>> = {};

test.beforeAll(async () => {
	test.setTimeout(180_000);
	server = await ownServer();
	await server.start();
	const people = { admin, engineer, inspector, welder, otherAdmin, otherEngineer };
	for (const [k, p] of Object.entries(people))
		cookies[k as keyof typeof cookies] = await signInCookie(server.origin, p.email, p.password);
	await makeFixtures(server.origin, cookies.engineer!, server.databaseFile);
	paramsFor = await demoParams(server.databaseFile);
});

test.afterAll(async () => {
	await server?.dispose();
});

test('every route in src/routes has an access rule, and every rule a route', () => {
	const keys = new Set(routes.map((r) => r.key));
	const missing = [...keys].filter((k) => !ACCESS_RULES[k]);
	const stale = Object.keys(ACCESS_RULES).filter((k) => !keys.has(k));
	expect(missing, 'add a line per route to tests/support/access-rules.ts').toEqual([]);
	expect(stale, 'these rules name routes that no longer exist').toEqual([]);
});

const allows = (rule: Access, role: Role) =>
	rule.allow === 'public' || rule.allow === 'members' || rule.allow.includes(role);

/** The other shop's member who would pass the role check, if any does. */
function outsider(rule: Access): { cookie: string; role: Role } {
	if (allows(rule, 'engineer')) return { cookie: cookies.otherEngineer!, role: 'engineer' };
	return { cookie: cookies.otherAdmin!, role: 'admin' };
}

interface Answer {
	status: number;
	location: string;
	body: string;
}

async function ask(route: AppRoute, path: string, cookie: string): Promise<Answer> {
	const headers: Record<string, string> = { origin: server.origin };
	if (cookie) headers.cookie = cookie;
	let init: RequestInit = { method: route.method, headers, redirect: 'manual' };
	if (route.kind === 'action') {
		headers.accept = 'application/json';
		headers['x-sveltekit-action'] = 'true';
		init = { ...init, body: new URLSearchParams() };
	} else if (route.method !== 'GET' && route.method !== 'HEAD') {
		headers['content-type'] = 'application/json';
		init = { ...init, body: '{}' };
	}
	const res = await fetch(server.origin + path, init);
	const body = await res.text();
	let status = res.status;
	let location = res.headers.get('location') ?? '';
	if (route.kind === 'action' && status === 200 && body.startsWith('{')) {
		// An enhanced action answers 200 and says its own status inside.
		const r = JSON.parse(body) as { type: string; status?: number; location?: string };
		status = r.status ?? 200;
		location = r.location ?? '';
	}
	return { status, location, body };
}

const refused = (a: Answer) =>
	[401, 403, 404].includes(a.status) ||
	(a.status >= 300 && a.status < 400 && a.location.startsWith('/signin'));

const named = (route: AppRoute) => /\[/.test(route.pattern);

/** The same route naming objects that do not exist. */
function ghostPath(route: AppRoute): string {
	const ghost = Object.fromEntries(
		Object.entries(paramsFor(route.pattern)).map(([k, v]) => [
			k,
			/^\d+$/.test(String(v))
				? 999_999
				: /^[0-9a-f-]{36}$/.test(String(v))
					? '00000000-0000-4000-8000-000000000000'
					: 'no-such-token-000000000000'
		])
	);
	const action = route.action && route.action !== 'default' ? `?/${route.action}` : '';
	return fillPath(route.pattern, ghost) + action;
}

function verdict(
	rule: Access,
	route: AppRoute,
	who: Who,
	a: Answer,
	ghost: Answer | null
): string | null {
	if (a.status >= 500) return `${a.status} server error`;
	const role: Role | null =
		who === 'anonymous' ? null : who === 'other' ? outsider(rule).role : who;
	const names = named(route);
	const allowed =
		rule.allow === 'public' || (role !== null && allows(rule, role) && (who !== 'other' || !names));
	if (allowed) {
		const ok = rule.ok ?? (route.method === 'GET' ? [200] : null);
		if (ok ? !ok.includes(a.status) : refused(a))
			return `allowed, but got ${a.status} ${a.location}`;
		return null;
	}
	if (ghost && !refused(a)) {
		// Answered before the lookup (a 400 for the empty body, a redirect): fine if the answer
		// is the one a missing object gets, so nothing tells that the object exists.
		if (a.status !== ghost.status || a.status === 200)
			return `another shop's object answers ${a.status}, a missing one ${ghost.status}`;
	} else if (!refused(a)) return `must be refused, got ${a.status} ${a.location}`;
	if (who === 'anonymous' && route.pattern.startsWith('/api/') && a.status !== 401)
		return `signed out on the API must be 401, got ${a.status}`;
	if (who === 'other' && names && role && allows(rule, role) && refused(a) && a.status !== 404)
		return `another shop's object must be 404, got ${a.status}`;
	if ((who === 'anonymous' || who === 'other') && MARKERS.test(a.body))
		return 'the refusal leaks the demo shop';
	return null;
}

test('access matrix: every route × every role, signed out and another shop', async () => {
	test.setTimeout(300_000);
	// Reads first: some empty actions change state (a link revoked, a PQR certified).
	const ordered = [...routes].sort(
		(a, b) => Number(a.method !== 'GET') - Number(b.method !== 'GET') || a.key.localeCompare(b.key)
	);
	const problems: string[] = [];
	const lines: string[] = [
		`${'route'.padEnd(64)} ${WHO.map((w) => w.slice(0, 5).padStart(6)).join('')}`
	];
	let sent = 0;
	for (const route of ordered) {
		const rule = ACCESS_RULES[route.key];
		if (!rule) continue; // reported by the test above
		const path =
			fillPath(route.pattern, paramsFor(route.pattern)) +
			(route.action && route.action !== 'default' ? `?/${route.action}` : '');
		const cells: string[] = [];
		for (const who of WHO) {
			const cookie =
				who === 'anonymous' ? '' : who === 'other' ? outsider(rule).cookie : cookies[who]!;
			const role = who === 'other' ? outsider(rule).role : who;
			const mayPass =
				role !== 'anonymous' && allows(rule, role) && !(who === 'other' && named(route));
			if (rule.skipAllowed && mayPass) {
				cells.push('skip'.padStart(6));
				continue;
			}
			const a = await ask(route, path, cookie);
			sent++;
			// Another shop's object must look exactly like no object at all.
			const ghost =
				who === 'other' && named(route) ? await ask(route, ghostPath(route), cookie) : null;
			const v = verdict(rule, route, who, a, ghost);
			if (v) problems.push(`${route.key} as ${who}: ${v}`);
			cells.push(`${v ? '!' : ''}${a.status}`.padStart(6));
		}
		lines.push(`${route.key.padEnd(64)} ${cells.join('')}`);
	}
	console.log(
		`[access] ${routes.length} routes × ${WHO.length} callers, ${sent} requests\n${lines.join('\n')}`
	);
	expect(problems).toEqual([]);
});
