/// <reference types="@sveltejs/kit" />
/// <reference no-default-lib="true"/>
/// <reference lib="esnext" />
/// <reference lib="webworker" />
// Beadline's service worker (issue #16): the booth keeps working when the shop's Wi-Fi does not.
// It precaches the app shell, keeps the booth pages and the own card a signed-in person opened
// online (per person, cleared on sign-out), serves them offline with an honest banner, and
// queues continuity taps made offline until the connection is back. Registered from signed-in
// pages; the booth view itself still ships no JavaScript.
import { build, files, version } from '$service-worker';
import { noticesBanner, offlineBanner, offlineNotice, queueBanner } from '$lib/offline/banners';
import { clearKept, keep, keptAsset, keptCopy, pruneKeptAssets } from '$lib/offline/kept';
import {
	boothTapToken,
	isKeptPath,
	MEMBER_HEADER,
	prependToBody,
	SAVED_AT_HEADER,
	stripScripts
} from '$lib/offline/pages';
import {
	addNotice,
	currentMember,
	dequeue,
	dropNotices,
	enqueue,
	replacedAt,
	setMember,
	setReplacedAt,
	takeNotices,
	waiting
} from '$lib/offline/queue';

const sw = self as unknown as ServiceWorkerGlobalScope;
const SHELL = `shell-${version}`;
/** Pages of the shell, fetched signed out so they hold nobody's data. */
const SHELL_PAGES = ['/offline', '/scan'];
// WOFF2 serves every browser that runs a service worker: the WOFF twins stay on the network.
const ASSETS = new Set([...build.filter((p) => !p.endsWith('.woff')), ...files]);
/** A connection this slow is treated as none: the kept copy (with its banner) is better. */
const NETWORK_TIMEOUT_MS = 15_000;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

sw.addEventListener('install', (event) => {
	event.waitUntil(
		(async () => {
			const cache = await caches.open(SHELL);
			await cache.addAll([...ASSETS]);
			for (const path of SHELL_PAGES) {
				const res = await fetch(path, { credentials: 'omit' });
				if (res.ok) await cache.put(path, res);
			}
			await sw.skipWaiting();
		})()
	);
});

sw.addEventListener('activate', (event) => {
	event.waitUntil(
		(async () => {
			// A new deployment: the old shells go, and the kept stylesheets no kept page links to.
			let replaced = false;
			for (const name of await caches.keys())
				if (name.startsWith('shell-') && name !== SHELL && (await caches.delete(name)))
					replaced = true;
			if (replaced) {
				// Pages this worker takes over were served by the old one: they offer a reload.
				await setReplacedAt(Date.now());
				await pruneKeptAssets().catch(() => undefined);
			}
			await sw.clients.claim();
		})()
	);
});

sw.addEventListener('message', (event) => {
	const type = (event.data as { type?: string } | null)?.type;
	if (type === 'flush') event.waitUntil(flushCurrent());
	// A page asks which deployment serves it, and since when (src/lib/offline/agent.js).
	else if (type === 'version')
		event.waitUntil(
			replacedAt().then((at) => event.ports[0]?.postMessage({ version, replacedAt: at }))
		);
	// A worker left waiting (none is, today: install skips the wait) moves in when asked.
	else if (type === 'skip-waiting') event.waitUntil(sw.skipWaiting());
});

sw.addEventListener('fetch', (event) => {
	const req = event.request;
	const url = new URL(req.url);
	if (url.origin !== sw.location.origin) return;
	if (req.method === 'POST' && req.mode === 'navigate') {
		if (url.pathname === '/signout') event.respondWith(signOut(req));
		else if (boothTapToken(url.pathname, url.search))
			event.respondWith(tap(req, url, boothTapToken(url.pathname, url.search)!));
		return;
	}
	if (req.method !== 'GET') return;
	if (ASSETS.has(url.pathname)) event.respondWith(asset(req, url.pathname));
	else if (req.mode === 'navigate') event.respondWith(navigate(req, url));
});

async function asset(req: Request, path: string): Promise<Response> {
	const hit = (await (await caches.open(SHELL)).match(path)) ?? (await keptAsset(path));
	return hit ?? fetch(req);
}

function fetchSoon(req: Request): Promise<Response> {
	return fetch(req, { signal: AbortSignal.timeout(NETWORK_TIMEOUT_MS) });
}

async function navigate(req: Request, url: URL): Promise<Response> {
	let member = await currentMember();
	if (member) await flush(member);
	let res: Response;
	try {
		res = await fetchSoon(req);
	} catch {
		return offline(url.pathname, member, false);
	}
	member = await learnMember(res, url.pathname, member);
	if (member && res.ok && res.type === 'basic' && isKeptPath(url.pathname))
		await keep(member, url.pathname, res.clone(), SHELL).catch(() => undefined);
	return decorate(res, member);
}

/** Who is signed in, from the answer; someone else or nobody clears the copies kept before. */
async function learnMember(res: Response, path: string, known: string | null) {
	const key = res.headers.get(MEMBER_HEADER);
	if (key && key !== known) {
		await clearKept(key);
		await setMember(key);
		return key;
	}
	// Pages that read the session answer without the header only when nobody is signed in (or
	// the session ended elsewhere: expired, "sign out everywhere", disabled).
	if (!key && known && (isKeptPath(path) || path === '/signin')) {
		await forget();
		return null;
	}
	return key;
}

async function forget() {
	await clearKept(null);
	await dropNotices();
	await setMember(null);
}

/** Puts the notices this person has not seen yet at the top of an online page. */
async function decorate(res: Response, member: string | null): Promise<Response> {
	if (!member || !(res.headers.get('content-type') ?? '').startsWith('text/html')) return res;
	const [notices, queued] = await Promise.all([takeNotices(member), waiting(member)]);
	if (!notices.length && !queued.length) return res;
	const html = prependToBody(
		await res.text(),
		noticesBanner(notices) + queueBanner(queued.length, false)
	);
	return new Response(html, {
		status: res.status,
		statusText: res.statusText,
		headers: res.headers
	});
}

/** Offline: the person's kept copy with the banner, or the plain "not on this phone" page. */
async function offline(path: string, member: string | null, justQueued: boolean) {
	const queued = member ? (await waiting(member)).length : 0;
	const top =
		(member ? noticesBanner(await takeNotices(member)) : '') + queueBanner(queued, justQueued);
	const shell = await caches.open(SHELL);
	if (SHELL_PAGES.includes(path) && path !== '/offline') {
		const page = await shell.match(path);
		if (page) return page;
	}
	const kept = member ? await keptCopy(member, path) : null;
	if (kept) {
		const savedAt = new Date(kept.headers.get(SAVED_AT_HEADER) ?? Date.now());
		const html = prependToBody(stripScripts(await kept.text()), offlineBanner(savedAt) + top);
		return new Response(html, { status: 200, headers: kept.headers });
	}
	const page = await shell.match('/offline');
	if (!page)
		return new Response('Offline, and this page is not on this phone.', {
			status: 503,
			headers: { 'content-type': 'text/plain; charset=utf-8' }
		});
	const html = prependToBody(await page.text(), offlineNotice() + top);
	return new Response(html, { status: 200, headers: page.headers });
}

/** "I welded with this today": straight to the server when it can go, else into the queue. */
async function tap(req: Request, url: URL, token: string): Promise<Response> {
	const copy = req.clone();
	const member = await currentMember();
	try {
		return await decorate(await fetchSoon(req), member);
	} catch {
		if (!member) return offline(url.pathname, null, false);
		const posted = (await copy.formData().catch(() => null))?.get('tapId');
		const id = typeof posted === 'string' && UUID.test(posted) ? posted : crypto.randomUUID();
		await enqueue({ id, token, member, madeAt: Date.now() });
		const withSync = sw.registration as ServiceWorkerRegistration & {
			sync?: { register(tag: string): Promise<void> };
		};
		await withSync.sync?.register('taps').catch(() => undefined);
		return offline(url.pathname, member, true);
	}
}

async function flushCurrent() {
	const member = await currentMember();
	if (member) await flush(member);
}

let flushing: Promise<void> | null = null;
/** Sends the person's queued taps, one at a time, once each; stops at the first that cannot go. */
function flush(member: string): Promise<void> {
	return (flushing ??= sendAll(member).finally(() => (flushing = null)));
}

async function sendAll(member: string) {
	for (const t of await waiting(member)) {
		let res: Response;
		try {
			res = await fetch(`/api/v1/booth/${encodeURIComponent(t.token)}/taps`, {
				method: 'POST',
				headers: { 'content-type': 'application/json' },
				body: JSON.stringify({ id: t.id, madeAt: new Date(t.madeAt).toISOString(), member }),
				signal: AbortSignal.timeout(NETWORK_TIMEOUT_MS)
			});
		} catch {
			return; // still offline: try again at the next page
		}
		// 401 (signed out), 409 (someone else signed in), 429 and 5xx: it waits for a later try.
		if (![200, 201, 400, 404, 422].includes(res.status)) return;
		const body = (await res.json().catch(() => ({}))) as { message?: string };
		const sent = res.status === 200 || res.status === 201;
		const message =
			body.message ?? (sent ? 'Sent.' : 'The server could not take this tap: ask an engineer.');
		await addNotice(member, { kind: sent ? 'sent' : 'refused', message, madeAt: t.madeAt });
		await dequeue(t.id);
	}
}

/** Sign-out from any page: taps go first while the session lasts, then every kept copy goes. */
async function signOut(req: Request): Promise<Response> {
	const member = await currentMember();
	if (member) await flush(member);
	await forget();
	try {
		return await fetch(req);
	} catch {
		return offline('/signout', null, false);
	}
}

interface SyncEvent extends ExtendableEvent {
	tag: string;
}
// Background Sync where the browser has it: the queue goes as soon as the connection is back.
sw.addEventListener('sync' as 'message', (event) => {
	const e = event as unknown as SyncEvent;
	if (e.tag === 'taps') e.waitUntil(flushCurrent());
});
