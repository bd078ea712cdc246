import { expect, test } from '@playwright/test';
import { ownServer, type OwnServer } from './support/own-server';
import { boothTokenOn, controlled, entriesOf, eventually, phone, query } from './support/offline';
import { isoDay } from './support/booth';
import { engineer, signIn, welder } from './support/people';

// The booth with no connection (issue #16), on a phone in Chromium: what a phone keeps, what it
// shows offline, and the continuity taps it queues. A server of the file's own, freshly seeded:
// the demo welder (Tomas) has logged no use today. Demo data: WPS-001 revision 1 superseded by
// revision 2 (GTAW), WPS-002 revision 1 in force (GMAW).

let server: OwnServer;
test.beforeAll(async () => {
	test.setTimeout(120_000);
	server = await ownServer();
	await server.start();
});
test.afterAll(async () => server?.dispose());

test('the manifest and the service worker register with no console errors; the app is installable', async ({
	browser
}) => {
	const { context, page } = await phone(browser, server);
	const errors: string[] = [];
	page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
	page.on('pageerror', (e) => errors.push(e.message));
	// The worker's own console too: an error while it installs or serves counts.
	context.on('serviceworker', (w) =>
		w.on('console', (m) => m.type() === 'error' && errors.push(`[worker] ${m.text()}`))
	);
	await signIn(page, welder);
	await controlled(page);
	const manifest = await page.request.get('/manifest.webmanifest');
	expect(manifest.headers()['content-type']).toContain('application/manifest+json');
	const m = (await manifest.json()) as {
		name: string;
		start_url: string;
		icons: { src: string }[];
	};
	expect(m.name).toBe('Beadline');
	expect(m.start_url).toBe('/booth');
	for (const icon of m.icons) expect((await page.request.get(icon.src)).status()).toBe(200);
	// Chromium's own installability checks, through the DevTools protocol.
	const cdp = await context.newCDPSession(page);
	const { installabilityErrors } = (await cdp.send('Page.getInstallabilityErrors')) as {
		installabilityErrors: { errorId: string }[];
	};
	// A test browser's context is incognito, which Chromium never installs from: not the app's.
	const ids = installabilityErrors.map((e) => e.errorId).filter((id) => id !== 'in-incognito');
	expect(ids).toEqual([]);
	const app = (await cdp.send('Page.getAppManifest')) as { errors: { message: string }[] };
	expect(app.errors).toEqual([]);
	await page.goto('/booth');
	// The booth view stays JavaScript-free with the worker installed and serving it.
	const booth = await page.goto(`/b/${await boothTokenOn(server, 'WPS-002', 1)}`);
	expect(booth?.fromServiceWorker()).toBe(true);
	expect(await page.locator('script').count()).toBe(0);
	// This document's own resources (the page before may still fetch its chunks as it goes).
	const scripts = await page.evaluate(() =>
		performance
			.getEntriesByType('resource')
			.map((e) => e.name)
			.filter((url) => /\.m?js(\?|$)/.test(url))
	);
	expect(scripts).toEqual([]);
	expect(errors).toEqual([]);
	// One shell, this deployment's: an older one is deleted when its successor takes over.
	const shells = await page.evaluate(async () =>
		(await caches.keys()).filter((k) => k.startsWith('shell-'))
	);
	expect(shells).toHaveLength(1);
	await context.close();
});

test('scanned online, reopened offline: the kept revision with the banner, warnings and cautions; a never-seen sheet says so', async ({
	browser
}) => {
	const { context, page } = await phone(browser, server);
	await signIn(page, welder);
	await controlled(page);
	const current = `/b/${await boothTokenOn(server, 'WPS-001', 2)}`;
	const superseded = `/b/${await boothTokenOn(server, 'WPS-001', 1)}`;
	const unseen = `/b/${await boothTokenOn(server, 'WPS-004', 1)}`;
	await page.goto(current);
	await expect(page.getByTestId('booth-values')).toContainText('Amperage');
	await page.goto(superseded);
	await expect(page.getByTestId('booth-warning')).toContainText('Superseded by revision 2');

	await context.setOffline(true);
	await page.goto(current);
	const banner = page.getByTestId('offline-banner');
	await expect(banner).toContainText('Offline: this is the copy saved on this phone on');
	await expect(banner).toContainText('Its status may have changed since');
	await expect(banner).toContainText('ask the inspector');
	expect(await banner.locator('time').getAttribute('datetime')).toMatch(/^\d{4}-\d\d-\d\dT/);
	await expect(page.getByTestId('booth-rev')).toHaveText('Revision 2');
	await expect(page.getByTestId('booth-values')).toContainText('Amperage');
	await expect(page.getByTestId('safety-cautions')).toContainText('lens shade at least');
	// Offline, a kept page is plain HTML: nothing of the app's script runs against missing data.
	expect(await page.locator('script').count()).toBe(0);

	await page.goto(superseded);
	await expect(page.getByTestId('offline-banner')).toBeVisible();
	await expect(page.getByTestId('booth-warning')).toContainText('Superseded by revision 2');
	await expect(page.getByTestId('booth-warning')).toContainText('Do not weld to this sheet');

	await page.goto(unseen);
	await expect(page.getByRole('heading', { name: 'Not on this phone' })).toBeVisible();
	await expect(page.getByTestId('not-on-phone')).toContainText('ask the inspector');
	await expect(page.getByTestId('safety-note')).toBeVisible();
	await context.close();
});

test('a tap offline waits on the phone, counts once when tapped twice, and is sent once when back online', async ({
	browser
}) => {
	const { context, page } = await phone(browser, server);
	await signIn(page, welder);
	await controlled(page);
	const path = `/b/${await boothTokenOn(server, 'WPS-001', 2)}`;
	const today = isoDay(new Date());
	expect(await entriesOf(server, welder.email, 'GTAW')).not.toContainEqual({ used_on: today });
	const before = (await entriesOf(server, welder.email, 'GTAW')).length;
	await page.goto(path);
	await context.setOffline(true);
	await page.goto(path);
	await page.getByTestId('booth-tap').click();
	await expect(page.getByTestId('offline-queue')).toHaveText('Waiting to send: 1');
	await expect(page.getByTestId('offline-banner')).toBeVisible();
	// The flaky connection: a second tap while the first waits is the same use.
	await page.getByTestId('booth-tap').click();
	await expect(page.getByTestId('offline-queue')).toHaveText('Waiting to send: 1');
	const queued = await query(server, 'SELECT id FROM continuity_taps');
	expect(queued).toEqual([]);

	await context.setOffline(false);
	await page.goto(path);
	await expect(page.getByTestId('tap-sent')).toContainText('Logged: GTAW on');
	await expect(page.getByTestId('booth-logged')).toContainText('Already logged');
	await expect(page.getByTestId('offline-queue')).toHaveCount(0);
	expect((await entriesOf(server, welder.email, 'GTAW')).length).toBe(before + 1);
	const taps = await query<{
		client_id: string;
		outcome: string;
		made_at: string;
		received_at: string;
	}>(
		server,
		"SELECT client_id, outcome, made_at, received_at FROM continuity_taps WHERE outcome = 'logged'"
	);
	expect(taps).toHaveLength(1);
	expect(taps[0]!.made_at <= taps[0]!.received_at).toBe(true);
	const audit = await query<{ after: string }>(
		server,
		"SELECT after FROM audit_events WHERE action = 'continuity.recorded' AND after LIKE ?",
		[`%${taps[0]!.client_id}%`]
	);
	expect(audit).toHaveLength(1);
	const trail = JSON.parse(audit[0]!.after) as { tap: { madeAt: string; receivedAt: string } };
	expect(trail.tap.madeAt <= trail.tap.receivedAt).toBe(true);

	// A retry after a lost answer sends the same id again, even twice at once: still one.
	const again = () =>
		page.request.post(`/api/v1/booth/${path.slice(3)}/taps`, {
			data: { id: taps[0]!.client_id, madeAt: new Date().toISOString() }
		});
	const answers = await Promise.all([again(), again()]);
	for (const a of answers) expect(a.status()).toBe(200);
	expect(((await answers[0]!.json()) as { repeat: boolean }).repeat).toBe(true);
	expect((await entriesOf(server, welder.email, 'GTAW')).length).toBe(before + 1);
	expect(await query(server, 'SELECT id FROM continuity_taps')).toHaveLength(1);
	await context.close();
});

test('a tap queued for a revision withdrawn meanwhile is refused with a message, never dropped', async ({
	browser
}) => {
	const { context, page } = await phone(browser, server);
	await signIn(page, welder);
	await controlled(page);
	const path = `/b/${await boothTokenOn(server, 'WPS-002', 1)}`;
	await page.goto(path);
	await context.setOffline(true);
	await page.goto(path);
	await page.getByTestId('booth-tap').click();
	await expect(page.getByTestId('offline-queue')).toHaveText('Waiting to send: 1');

	// Meanwhile, in the office: the engineer withdraws the revision.
	const office = await browser.newContext({ baseURL: server.origin });
	const officePage = await office.newPage();
	await signIn(officePage, engineer);
	const [proc] = await query<{ id: number }>(
		server,
		"SELECT id FROM procedures WHERE number = 'WPS-002'"
	);
	const w = await officePage.request.post(`/api/v1/procedures/${proc!.id}/revisions/1/withdraw`, {
		data: { reason: 'Offline test: withdrawn while a tap waited' }
	});
	expect(w.status()).toBe(200);
	await office.close();

	await context.setOffline(false);
	await page.goto('/booth');
	const refused = page.getByTestId('tap-refused');
	await expect(refused).toContainText('Not logged');
	await expect(refused).toContainText('not the one in force');
	const rows = await eventually(
		() =>
			query<{ outcome: string }>(
				server,
				"SELECT outcome FROM continuity_taps WHERE outcome = 'refused'"
			),
		(r) => r.length === 1
	);
	expect(rows).toHaveLength(1);
	expect(
		await query(server, "SELECT id FROM audit_events WHERE action = 'continuity.refused'")
	).toHaveLength(1);
	expect(await entriesOf(server, welder.email, 'GMAW')).not.toContainEqual({
		used_on: isoDay(new Date())
	});
	await context.close();
});

test('sign-out clears what the phone kept: nothing is readable offline after it', async ({
	browser
}) => {
	const { context, page } = await phone(browser, server);
	await signIn(page, welder);
	await controlled(page);
	const path = `/b/${await boothTokenOn(server, 'WPS-001', 2)}`;
	await page.goto(path);
	await page.goto('/welders/me');
	expect(
		await page.evaluate(async () => (await caches.keys()).filter((k) => k.startsWith('kept-')))
	).not.toEqual([]);
	await page.getByRole('button', { name: 'Sign out' }).click();
	await expect(page).toHaveURL(/\/signin/);
	expect(
		await eventually(
			() => page.evaluate(async () => (await caches.keys()).filter((k) => k.startsWith('kept-'))),
			(k) => k.length === 0
		)
	).toEqual([]);
	await context.setOffline(true);
	for (const p of [path, '/welders/me', '/booth']) {
		await page.goto(p);
		await expect(page.getByRole('heading', { name: 'Not on this phone' })).toBeVisible();
		await expect(page.getByTestId('booth-values')).toHaveCount(0);
	}
	await context.close();
});

test('a shared phone: the next person never sees the last person’s kept pages', async ({
	browser
}) => {
	const { context, page } = await phone(browser, server);
	await signIn(page, welder);
	await controlled(page);
	const path = `/b/${await boothTokenOn(server, 'WPS-001', 2)}`;
	await page.goto(path);
	// The welder's session ends without a sign-out here (it expired, or "sign out everywhere").
	await context.clearCookies();
	await signIn(page, engineer);
	await page.goto('/booth');
	await context.setOffline(true);
	await page.goto(path);
	await expect(page.getByRole('heading', { name: 'Not on this phone' })).toBeVisible();
	await page.goto('/booth');
	// The engineer's own copy of the booth page, not the welder's.
	await expect(page.getByTestId('offline-banner')).toBeVisible();
	await expect(page.getByTestId('whoami')).toContainText('Reuben');
	await context.close();
});
