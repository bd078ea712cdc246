import { chromium, expect, test } from '@playwright/test';
import {
	boothToken,
	isoDay,
	procedureId,
	qrVideo,
	sixMonthsAfter,
	usesToday
} from './support/booth';
import { admin, engineer, otherAdmin, signIn, welder } from './support/people';

// The booth, on a phone: what a scan shows signed out and signed in, the warning on a stale
// sheet, the one-tap continuity log, a withdrawn link, the sheet download and the scanner.
// Data: the demo seed (WPS-001 revision 1 superseded by 2, WPS-002 revision 1 in force, WPS-004
// withdrawn); tokens are read from the server's database.

const today = () => isoDay(new Date());

test('a superseded sheet shows the warning and leads to the current revision; signed out sees status only', async ({
	page
}) => {
	const res = await page.goto(`/b/${await boothToken('WPS-001', 1)}`);
	expect(res?.headers()['cache-control']).toBe('no-store');
	const warning = page.getByTestId('booth-warning');
	await expect(warning).toBeVisible();
	await expect(warning).toContainText('Superseded by revision 2');
	await expect(warning).toContainText('Do not weld to this sheet');
	// The page ships no JavaScript of its own.
	expect(await page.locator('script[src], link[rel="modulepreload"]').count()).toBe(0);
	await page.getByTestId('booth-current').click();
	await expect(page).toHaveURL(new RegExp(`/b/${await boothToken('WPS-001', 2)}$`));
	await expect(page.getByTestId('booth-number')).toHaveText('WPS-001');
	await expect(page.getByTestId('booth-rev')).toHaveText('Revision 2');
	await expect(page.getByTestId('booth-warning')).toHaveCount(0);
	await expect(page.getByTestId('booth-signed-out')).toBeVisible();
	await expect(page.getByTestId('booth-values')).toHaveCount(0);
	await expect(page.getByTestId('safety-note')).toBeVisible();
});

test('a welder of the shop sees the values and cautions, and one tap logs GTAW once today', async ({
	page
}) => {
	const path = `/b/${await boothToken('WPS-001', 2)}`;
	const before = await usesToday(welder.email, 'GTAW', today());
	await signIn(page, welder);
	// The welder's own GTAW qualification (seeded: last used 12 days ago).
	const lapsesOn = page
		.locator('[data-testid="qualification"][data-process="GTAW"]')
		.getByTestId('lapses-on');
	await page.goto('/welders/me');
	const was = await lapsesOn.textContent();
	await page.goto(path);
	const values = page.getByTestId('booth-values');
	await expect(values).toContainText('Amperage');
	await expect(values).toContainText(' A');
	// No value tile breaks a word across lines on the phone ("suggeste / d"): every word of every
	// value lies on one line box, at the 390 px of a small phone.
	const phone = page.viewportSize();
	await page.setViewportSize({ width: 390, height: 844 });
	const brokenWords = await values.locator('dd').evaluateAll((dds) =>
		dds.flatMap((dd) => {
			const node = [...dd.childNodes].find((n) => n.nodeType === Node.TEXT_NODE);
			if (!node) return [];
			const text = node.textContent ?? '';
			const out: string[] = [];
			// A word: letters and digits up to a space, dash or slash (where a line may break).
			for (const m of text.matchAll(/[^\s\-–/]+/g)) {
				const r = document.createRange();
				r.setStart(node, m.index);
				r.setEnd(node, m.index + m[0].length);
				const lines = new Set([...r.getClientRects()].map((b) => Math.round(b.top)));
				if (lines.size > 1) out.push(m[0]);
			}
			return out;
		})
	);
	expect(brokenWords).toEqual([]);
	if (phone) await page.setViewportSize(phone);
	await expect(page.getByTestId('safety-cautions')).toContainText('lens shade at least');
	const tap = page.getByTestId('booth-tap');
	if (before === 0) {
		await tap.click();
		await expect(page.getByTestId('booth-logged')).toContainText(`Logged: GTAW on ${today()}`);
	}
	await page.goto(path);
	await expect(page.getByTestId('booth-logged')).toContainText('Already logged');
	await expect(page.getByTestId('booth-tap')).toHaveCount(0);
	// A second post the same day (a double tap, a reload) changes nothing.
	const again = await page.request.post(`${path}?/used`, {
		headers: { origin: new URL(page.url()).origin },
		form: {}
	});
	expect(again.status()).toBe(200);
	expect(await usesToday(welder.email, 'GTAW', today())).toBe(1);

	// The tap restarted the six months: the lapse date moved to six months after today.
	await page.goto('/welders/me');
	await expect(lapsesOn).toHaveText(sixMonthsAfter(today())); // ASME IX QW-322.1
	if (before === 0) expect(was! < sixMonthsAfter(today()), `was ${was}`).toBe(true);
});

test('a withdrawn revision shows the warning; with none in force it says so', async ({ page }) => {
	// Demo WPS-004: revision 1 approved, then withdrawn, and no revision after it.
	await page.goto(`/b/${await boothToken('WPS-004', 1)}`);
	await expect(page.getByTestId('booth')).toHaveAttribute('data-state', 'withdrawn');
	const warning = page.getByTestId('booth-warning');
	await expect(warning).toBeVisible();
	await expect(warning).toContainText('Withdrawn');
	await expect(warning).toContainText('Do not weld to this sheet.');
	await expect(warning).toContainText('No revision of this procedure is in force now.');
	await expect(page.getByTestId('booth-current')).toHaveCount(0);
	await expect(page.getByTestId('booth-number')).toHaveText('WPS-004');
	// Signed in, a member still gets no values to weld to.
	await signIn(page, engineer);
	await page.goto(`/b/${await boothToken('WPS-004', 1)}`);
	await expect(page.getByTestId('booth-warning')).toContainText('Withdrawn');
	await expect(page.getByTestId('booth-values')).toHaveCount(0);
});

test('a member without a welder record sees the values and says so plainly; another shop sees status only', async ({
	browser
}) => {
	const path = `/b/${await boothToken('WPS-002', 1)}`;
	const mine = await browser.newPage();
	await signIn(mine, engineer);
	await mine.goto(path);
	await expect(mine.getByTestId('booth-values')).toContainText('Voltage');
	await expect(mine.getByTestId('booth-no-welder')).toContainText('not linked to a welder record');
	await mine.close();

	const other = await browser.newPage();
	await signIn(other, otherAdmin);
	await other.goto(path);
	await expect(other.getByTestId('booth-number')).toHaveText('WPS-002');
	await expect(other.getByTestId('booth-other-shop')).toBeVisible();
	await expect(other.getByTestId('booth-values')).toHaveCount(0);
	await other.close();
});

test('an admin withdraws a link: the old sheet reads "link withdrawn"; the sheet downloads as a PDF', async ({
	page
}) => {
	const old = await boothToken('WPS-004', 1);
	const id = await procedureId('WPS-004');
	await signIn(page, admin);
	await page.goto(`/procedures/${id}/booth-link`);
	await page
		.getByTestId('booth-link-row')
		.filter({ hasText: 'Revision 1' })
		.getByTestId('booth-reissue')
		.click();
	await expect(page.getByTestId('flash')).toContainText('has a new link');
	await page.goto(`/b/${old}`);
	await expect(page.getByTestId('booth-withdrawn-link')).toContainText('Link withdrawn');
	expect(await boothToken('WPS-004', 1)).not.toBe(old);

	await page.goto(`/procedures/${await procedureId('WPS-002')}`);
	const download = page.waitForEvent('download');
	await page.getByTestId('print-sheet').click();
	expect((await download).suggestedFilename()).toBe('WPS-002-rev1-letter.pdf');
	const sheet = await page.request.get(
		`/procedures/${await procedureId('WPS-002')}/sheet?paper=a4`
	);
	expect(sheet.status()).toBe(200);
	expect(sheet.headers()['content-type']).toBe('application/pdf');
	expect(sheet.headers()['content-disposition']).toBe('attachment; filename="WPS-002-rev1-a4.pdf"');
	expect((await sheet.body()).subarray(0, 5).toString()).toBe('%PDF-');
	const bad = await page.request.get(`/procedures/${id}/sheet?paper=tabloid`);
	expect(bad.status()).toBe(400);
});

test('the scanner reads a sheet’s code from the camera and opens its booth view', async ({
	baseURL
}) => {
	const token = await boothToken('WPS-002', 1);
	const video = qrVideo(`${baseURL}/b/${token}`);
	const browser = await chromium.launch({
		executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
		args: [
			'--no-sandbox',
			'--disable-gpu',
			'--use-fake-ui-for-media-stream',
			'--use-fake-device-for-media-stream',
			`--use-file-for-fake-video-capture=${video}`
		]
	});
	try {
		const page = await browser.newPage({ baseURL, viewport: { width: 412, height: 915 } });
		await page.goto('/scan');
		await expect(page).toHaveURL(new RegExp(`/b/${token}$`), { timeout: 15_000 });
		await expect(page.getByTestId('booth-number')).toHaveText('WPS-002');
	} finally {
		await browser.close();
	}
});
