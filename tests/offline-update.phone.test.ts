import { expect, test, type Page } from '@playwright/test';
import { freePort, ownServer, type OwnServer } from './support/own-server';
import { boothTokenOn, controlled, phone } from './support/offline';
import { redeployProxy, type RedeployProxy } from './support/redeploy-proxy';
import { signIn, welder } from './support/people';

// A new deployment reaches a phone that has the old one installed (issue #16, item 5): on the
// next visit the new worker replaces the cached shell, the page offers a reload, and the old
// caches are gone. One build: a proxy in front of the file's own server "deploys" by serving the
// built worker with another version string (tests/support/redeploy-proxy.ts), which is all a
// phone can tell of a deployment before it reloads.

let server: OwnServer;
let proxy: RedeployProxy;
test.beforeAll(async () => {
	test.setTimeout(120_000);
	const backend = await freePort();
	// The server keeps the proxy's address as its ORIGIN (sign-in forms check it) and listens
	// behind it.
	server = await ownServer({ env: { PORT: String(backend) } });
	proxy = await redeployProxy({ port: Number(new URL(server.origin).port), backend });
	await server.start();
});
test.afterAll(async () => {
	await server?.dispose();
	await proxy?.close();
});

const cacheNames = (page: Page, prefix: string) =>
	page.evaluate(async (p) => (await caches.keys()).filter((k) => k.startsWith(p)).sort(), prefix);

/** The version the worker controlling the page carries, asked as src/lib/offline/agent.js asks. */
const workerVersion = (page: Page) =>
	page.evaluate(
		() =>
			new Promise<string>((resolve) => {
				const channel = new MessageChannel();
				channel.port1.onmessage = (e: MessageEvent<{ version: string }>) => resolve(e.data.version);
				navigator.serviceWorker.controller!.postMessage({ type: 'version' }, [channel.port2]);
			})
	);

const keptAssets = (page: Page) =>
	page.evaluate(async () =>
		(await (await caches.open('kept-assets')).keys()).map((r) => new URL(r.url).pathname)
	);

test('a new deployment replaces the cached shell on the next visit, offers a reload and deletes the old caches', async ({
	browser
}) => {
	const { context, page } = await phone(browser, server);
	const errors: string[] = [];
	page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
	page.on('pageerror', (e) => errors.push(e.message));
	await signIn(page, welder);
	await controlled(page);
	// What the phone installs first: the build, or the last "deployment" of a repeated run.
	const old = proxy.version;
	await expect.poll(() => workerVersion(page)).toBe(old);
	expect(await cacheNames(page, 'shell-')).toEqual([`shell-${old}`]);
	// A first install is no update: nothing to reload.
	await expect(page.getByTestId('app-updated')).toHaveCount(0);

	// A booth page kept under the old deployment; a shell and a kept stylesheet that an even
	// older one left behind.
	const booth = `/b/${await boothTokenOn(server, 'WPS-002', 1)}`;
	await page.goto(booth);
	await expect(page.getByTestId('booth-values')).toContainText('Amperage');
	const stale = '/_app/immutable/assets/left-by-an-older-deployment.css';
	await page.evaluate(async (path) => {
		await caches.open('shell-an-older-deployment');
		await (await caches.open('kept-assets')).put(path, new Response('', { status: 200 }));
	}, stale);
	const linked = (await keptAssets(page)).filter((p) => p !== stale);
	expect(linked.some((p) => p.endsWith('.css'))).toBe(true);

	const next = proxy.redeploy();
	// The next visit: the old worker serves it, the browser finds the new worker, which installs,
	// takes over and says so.
	await page.goto('/booth');
	const prompt = page.getByTestId('app-updated');
	await expect(prompt).toBeVisible({ timeout: 20_000 });
	await expect(prompt).toContainText('Beadline was updated.');
	await expect
		.poll(() => cacheNames(page, 'shell-'), { timeout: 20_000 })
		.toEqual([`shell-${next}`]);
	// The kept page still reads right: its stylesheet stays, the one nothing links to goes.
	await expect.poll(() => keptAssets(page)).not.toContain(stale);
	expect(await keptAssets(page)).toEqual(expect.arrayContaining(linked));

	// Reload: the page comes from the new deployment's worker and shell.
	const fromWorker: { url: string; sw: boolean }[] = [];
	page.on('response', (r) => {
		if (new URL(r.url()).pathname.startsWith('/_app/immutable/'))
			fromWorker.push({ url: new URL(r.url()).pathname, sw: r.fromServiceWorker() });
	});
	const loaded = page.waitForEvent('load');
	await prompt.getByRole('button', { name: 'Reload' }).click();
	await loaded;
	await expect(page.getByTestId('whoami')).toBeVisible();
	await expect.poll(() => workerVersion(page)).toBe(next);
	expect(fromWorker.length).toBeGreaterThan(0);
	expect(fromWorker.filter((r) => !r.sw)).toEqual([]);
	const inNewShell = await page.evaluate(
		async ({ name, urls }) => {
			const shell = await caches.open(name);
			return Promise.all(urls.map(async (u) => !!(await shell.match(u))));
		},
		{ name: `shell-${next}`, urls: fromWorker.map((r) => r.url) }
	);
	expect(inNewShell.every(Boolean)).toBe(true);
	// Served by the worker that was already in charge when the page was asked for: no prompt.
	await expect(prompt).toHaveCount(0);

	// Offline, the shell is the new one (the only one left): the scanner and the kept page.
	await context.setOffline(true);
	await page.goto('/scan');
	await expect(page.getByRole('heading', { name: 'Scan a procedure sheet' })).toBeVisible();
	await page.goto(booth);
	await expect(page.getByTestId('offline-banner')).toBeVisible();
	await expect(page.getByTestId('booth-values')).toContainText('Amperage');
	expect(errors).toEqual([]);
	await context.close();
});

test('a page kept open across a deployment offers the reload when the phone comes back to it', async ({
	browser
}) => {
	const { context, page } = await phone(browser, server);
	await signIn(page, welder);
	await controlled(page);
	const old = proxy.version;
	await expect.poll(() => workerVersion(page)).toBe(old);
	const opened = await page.evaluate(() => performance.timeOrigin);

	const next = proxy.redeploy();
	// Back from the background (the app switcher, a locked screen): no page loads, and the page
	// itself asks the browser to look for a new worker.
	await page.evaluate(() => document.dispatchEvent(new Event('visibilitychange')));
	await expect(page.getByTestId('app-updated')).toBeVisible({ timeout: 20_000 });
	await expect.poll(() => cacheNames(page, 'shell-')).toEqual([`shell-${next}`]);
	expect(await page.evaluate(() => performance.timeOrigin)).toBe(opened);
	await context.close();
});
