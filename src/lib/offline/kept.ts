// The pages kept for offline use, one Cache Storage cache a person ("kept-<member key>"), at most
// MAX_KEPT of them, the oldest-opened first out; and the stylesheets and fonts those pages link
// to ("kept-assets"), so a copy still reads right after a new deployment replaced the shell.
import { linkedAssets, MAX_KEPT, SAVED_AT_HEADER } from './pages';

const PREFIX = 'kept-';
export const ASSETS = 'kept-assets';
const keptName = (member: string) => `${PREFIX}${member}`;

/** Saves an answer the phone got online as the person's copy of the page, stamped now. */
export async function keep(member: string, path: string, res: Response, shell: string) {
	const html = await res.text();
	const headers = new Headers(res.headers);
	headers.set(SAVED_AT_HEADER, new Date().toISOString());
	const cache = await caches.open(keptName(member));
	// Delete first so a page opened again moves to the newest end of the cache's order.
	await cache.delete(path);
	await cache.put(path, new Response(html, { status: 200, headers }));
	const keys = await cache.keys();
	for (const old of keys.slice(0, Math.max(0, keys.length - MAX_KEPT))) await cache.delete(old);
	await keepAssets(html, path, shell);
}

async function keepAssets(html: string, path: string, shell: string) {
	const [assets, shellCache] = await Promise.all([caches.open(ASSETS), caches.open(shell)]);
	for (const href of linkedAssets(html)) {
		const url = new URL(href, new URL(path, self.location.origin)).pathname;
		if (!url.startsWith('/_app/immutable/') || (await assets.match(url))) continue;
		const hit = (await shellCache.match(url)) ?? (await fetch(url).catch(() => null));
		if (hit?.ok) await assets.put(url, hit.clone());
	}
}

export async function keptCopy(member: string, path: string): Promise<Response | null> {
	if (!(await caches.has(keptName(member)))) return null;
	return (await (await caches.open(keptName(member))).match(path)) ?? null;
}

/** Everyone's copies but `except`'s: a shared phone never shows the last person's pages. */
export async function clearKept(except: string | null = null) {
	for (const name of await caches.keys())
		if (name.startsWith(PREFIX) && name !== ASSETS && name !== (except && keptName(except)))
			await caches.delete(name);
	if (!except) await caches.delete(ASSETS);
}

/** An asset of an older shell that a kept page still needs. */
export async function keptAsset(path: string): Promise<Response | null> {
	if (!(await caches.has(ASSETS))) return null;
	return (await (await caches.open(ASSETS)).match(path)) ?? null;
}

/**
 * After a new deployment: the kept stylesheets and fonts that no kept page links to any more
 * (pages opened again since were saved with the new deployment's) go with the old shell.
 */
export async function pruneKeptAssets() {
	if (!(await caches.has(ASSETS))) return;
	const linked = new Set<string>();
	for (const name of await caches.keys()) {
		if (!name.startsWith(PREFIX) || name === ASSETS) continue;
		const cache = await caches.open(name);
		for (const req of await cache.keys()) {
			const page = await cache.match(req);
			if (!page) continue;
			for (const href of linkedAssets(await page.text()))
				linked.add(new URL(href, req.url).pathname);
		}
	}
	const assets = await caches.open(ASSETS);
	for (const req of await assets.keys())
		if (!linked.has(new URL(req.url).pathname)) await assets.delete(req);
}
