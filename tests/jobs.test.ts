// A job from opening to its joint list: the engineer opens it, pastes a list with mistakes
// (every line named, nothing added), fixes it and adds it whole, attaches the drawing and marks
// joints on it; a welder can read it.
import { expect, test } from '@playwright/test';
import sharp from 'sharp';
import { engineer, inspector, signIn, welder } from './support/people';
import { readDataBook } from './support/data-book';
import { uniqueNumber } from './support/procedures';

test.describe.configure({ timeout: 90_000 });

test('an engineer opens a job and lists its joints from a pasted list', async ({
	page,
	browser
}) => {
	await signIn(page, engineer);
	await page.goto('/jobs/new');
	const number = uniqueNumber('JOB');
	await page.getByLabel('Job number').fill(number);
	await page.getByLabel('Customer').fill('Invented Mills');
	await page.getByLabel('Part or assembly').fill('Conveyor frame');
	await page.getByRole('button', { name: 'Open the job' }).click();
	await expect(page).toHaveURL(/\/jobs\/\d+\?created=1$/);
	const jobUrl = new URL(page.url()).pathname;

	const csv = page.getByLabel('Joint list');
	await csv.fill(
		'mark,type,position,procedure\nJ1,tee,2F,WPS-001\nJ2,spiral,2F,WPS-001\nJ3,tee,2F,WPS-NONE'
	);
	await page.getByRole('button', { name: 'Check and add' }).click();
	const problems = page.getByTestId('csv-problems');
	await expect(problems).toContainText('Line 3 (J2): type:');
	await expect(problems).toContainText('Line 4 (J3): procedure: no procedure WPS-NONE');
	await expect(page.getByTestId('joints-table')).toHaveCount(0);
	await expect(csv).toHaveValue(/J2,spiral/); // what was pasted is kept to fix in place

	await csv.fill('mark,type,position,procedure\nJ1,tee,2F,WPS-001\nJ2,tee,1F,WPS-001');
	await page.getByRole('button', { name: 'Check and add' }).click();
	await expect(page.getByText('2 joints added.')).toBeVisible();
	await expect(page.getByTestId('joint-row')).toHaveCount(2);
	await expect(page.getByTestId('joint-row').first()).toContainText('WPS-001 rev 2');

	const add = page.getByTestId('add-joint');
	await add.getByLabel('Mark').fill('J3');
	await add.getByLabel('Position').selectOption('2F');
	await add.getByLabel('Procedure number').fill('WPS-002');
	await add.getByRole('button', { name: 'Add the joint' }).click();
	await expect(page.getByTestId('joint-row')).toHaveCount(3);

	// The drawing: a PDF is refused for marking only in words; an image is marked by a click on
	// it, and by keys (the joint picked, its position typed and Enter).
	await page.getByLabel(/Attach the drawing/).setInputFiles({
		name: 'frame.txt',
		mimeType: 'image/png',
		buffer: Buffer.from('not an image')
	});
	await page.getByRole('button', { name: 'Upload the drawing' }).click();
	await expect(page.getByTestId('drawing-form')).toContainText('is not a PDF or JPEG or PNG file');
	const png = await sharp({
		create: { width: 400, height: 200, channels: 3, background: '#ffffff' }
	})
		.png()
		.toBuffer();
	await page.getByLabel(/Attach the drawing/).setInputFiles({
		name: 'frame.png',
		mimeType: 'image/png',
		buffer: png
	});
	await page.getByRole('button', { name: 'Upload the drawing' }).click();
	await expect(page.getByText('Drawing attached.')).toBeVisible();
	const drawing = page.getByTestId('drawing');
	await expect(drawing.locator('img')).toBeVisible();
	const marker = page.getByTestId('marker-form');
	await marker.getByLabel('Joint to mark').selectOption({ label: 'J1 (not marked)' });
	const box = (await drawing.boundingBox())!;
	await drawing.click({ position: { x: box.width / 4, y: box.height / 2 } });
	await expect(page.getByText('Marker placed.')).toBeVisible();
	const j1 = page.locator('[data-testid="marker"][data-mark="J1"]');
	await expect(j1).toHaveAttribute('title', 'J1: Not welded');
	await marker.getByLabel('Joint to mark').selectOption({ label: 'J2 (not marked)' });
	await marker.getByLabel(/Across/).fill('0.75');
	await marker.getByLabel(/Down/).fill('0.5');
	await marker.getByLabel(/Down/).press('ArrowUp'); // 0.51: arrow keys move it too
	await marker.getByLabel(/Down/).press('Enter');
	await expect(page.locator('[data-testid="marker"][data-mark="J2"]')).toBeVisible();
	await expect(page.getByTestId('legend')).toContainText('Rejected: repair');
	await expect(page.getByTestId('drawing-panel')).toContainText('2 of 3 joints marked.');
	await marker.getByLabel('Joint to mark').selectOption({ label: 'J3 (not marked)' });
	await marker.getByLabel(/Across/).fill('1.5');
	await marker.getByLabel(/Down/).fill('0.5');
	await marker.getByRole('button', { name: 'Place the marker' }).click();
	await expect(marker).toContainText('Give a number from 0 to 1');

	const w = await (await browser.newContext()).newPage();
	await signIn(w, welder);
	await w.goto(jobUrl);
	await expect(w.getByTestId('joint-row')).toHaveCount(3);
	await expect(w.getByTestId('add-joint')).toHaveCount(0);
	await w.goto('/jobs/new');
	await expect(w.getByText(/403|not allow/i).first()).toBeVisible();
});

test('a welder logs passes on a joint; an unqualified position is refused in words', async ({
	page
}) => {
	await signIn(page, welder);
	await page.goto('/booth');
	await page.getByTestId('booth-jobs').click();
	await page.getByRole('link', { name: 'JOB-2026-014' }).click();
	// Tomas holds GMAW 2G: fillet F and H by QW-461.9, not V. W4 is a 2F fillet to WPS-002 (GMAW).
	const w4 = page.locator('[data-testid="joint-row"][data-mark="W4"]');
	await w4.getByLabel('Root').check();
	await w4.getByLabel('Fill').check();
	await w4.getByRole('button', { name: 'Welded by me today' }).click();
	await expect(w4.getByTestId('weld-logs')).toContainText('Root: LTR-07 Tomas Whitlow');
	await expect(w4.getByTestId('weld-logs')).toContainText('Fill');
	await expect(w4.getByLabel('Root')).toHaveCount(0); // a logged pass is not offered again

	const w5 = page.locator('[data-testid="joint-row"][data-mark="W5"]');
	await w5.getByLabel('Root').check();
	await w5.getByRole('button', { name: 'Welded by me today' }).click();
	await expect(w5.getByTestId('log-refused')).toContainText(
		'Tomas Whitlow may not weld W5 to WPS-002 rev 1: not qualified for fillet V'
	);
	await expect(w5.getByTestId('weld-logs')).toHaveCount(0);
});

test('an inspector signs an override with a reason; the refused welder may then log', async ({
	page,
	browser
}) => {
	await signIn(page, inspector);
	await page.goto('/jobs');
	await page.getByRole('link', { name: 'JOB-2026-014' }).click();
	const form = page.getByTestId('override-form');
	await form.getByLabel('Joint').selectOption({ label: 'W5' });
	await form.getByLabel('Welder').selectOption({ label: 'LTR-07 Tomas Whitlow' });
	await form.getByLabel('Reason').fill('3F coupon witnessed today; WPQ paperwork to follow.');
	await form.getByLabel(/Your password/).fill('not my password');
	await form.getByRole('button', { name: 'Sign the override' }).click();
	await expect(form).toContainText('That password is not right. Nothing was signed.');
	await form.getByLabel(/Your password/).fill(inspector.password);
	await form.getByRole('button', { name: 'Sign the override' }).click();
	await expect(form).toContainText('Override signed.');
	const w5 = page.locator('[data-testid="joint-row"][data-mark="W5"]');
	await expect(w5.getByTestId('override')).toContainText('signed by Mirela Sand (Inspector)');
	await expect(w5.getByTestId('override')).toContainText('not qualified for fillet V');

	const w = await (await browser.newContext()).newPage();
	await signIn(w, welder);
	await w.goto(new URL(page.url()).pathname);
	const row = w.locator('[data-testid="joint-row"][data-mark="W5"]');
	await row.getByLabel('Root').check();
	await row.getByRole('button', { name: 'Welded by me today' }).click();
	await expect(row.getByTestId('weld-logs')).toContainText('Root: LTR-07 Tomas Whitlow');
	await expect(row.getByTestId('weld-logs')).toContainText('(under override)');
});

test('an inspector rejects a joint, a repair is opened, welded and accepted; the counts follow', async ({
	page,
	browser
}) => {
	await signIn(page, inspector);
	await page.goto('/jobs');
	await page.getByRole('link', { name: 'JOB-2026-014' }).click();
	await expect(page).toHaveURL(/\/jobs\/\d+$/); // the job page, not the list still
	const jobPath = new URL(page.url()).pathname;
	const form = page.getByTestId('inspection-form');
	const inspect = async (result: 'Accept' | 'Reject', note: string, report?: Buffer) => {
		await form.getByLabel('Joint').selectOption({ label: 'W4' });
		if (report)
			await form
				.getByLabel(/^Report/)
				.setInputFiles({ name: 'W4-rt.pdf', mimeType: 'application/pdf', buffer: report });
		await form.getByLabel('Method').selectOption('RT');
		await form.getByLabel('Result').selectOption({ label: result });
		await form.getByLabel('Note').fill(note);
		await form.getByLabel(/Your password/).fill(inspector.password);
		await form.getByRole('button', { name: 'Sign the inspection' }).click();
		await expect(form).toContainText('Inspection signed.');
	};
	const film = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n');
	await inspect('Reject', 'Lack of fusion at the root, 20 mm.', film);
	const w4 = page.locator('[data-testid="joint-row"][data-mark="W4"]');
	await expect(w4.getByTestId('joint-status')).toHaveAttribute('data-status', 'rejected');
	await expect(w4.getByTestId('joint-steps')).toContainText('RT 100 %: rejected');
	// The report is kept with the signed inspection and downloads whole, as a PDF.
	const link = w4.getByTestId('report-link').last();
	await expect(link).toContainText('W4-rt.pdf');
	const served = await page.request.get((await link.getAttribute('href'))!);
	expect(served.status()).toBe(200);
	expect(served.headers()['content-type']).toBe('application/pdf');
	expect(Buffer.from(await served.body()).equals(film)).toBe(true);
	// On the drawing, the rejected joint reads so without its colour.
	await expect(page.locator('[data-testid="marker"][data-mark="W4"]')).toHaveAttribute(
		'title',
		'W4: Rejected: repair'
	);

	const repair = page.getByTestId('repair-form');
	await repair.getByLabel('Rejected joint').selectOption({ label: 'W4' });
	await repair.getByLabel('Repair welder').selectOption({ label: 'LTR-07 Tomas Whitlow' });
	await repair.getByLabel('Repair procedure number').fill('WPS-002');
	await repair.getByRole('button', { name: 'Open the repair' }).click();
	await expect(repair).toContainText('Repair 1 opened.');
	await expect(w4.getByTestId('joint-status')).toHaveAttribute('data-status', 'repaired');

	const w = await (await browser.newContext()).newPage();
	await signIn(w, welder);
	await w.goto(jobPath);
	const row = w.locator('[data-testid="joint-row"][data-mark="W4"]');
	await row.getByLabel('Root').check();
	await row.getByRole('button', { name: 'Welded by me today' }).click();
	await expect(row.getByTestId('weld-logs')).toContainText('Root: LTR-07 Tomas Whitlow');

	await page.reload();
	await inspect('Accept', 'Repair sound.');
	await expect(w4.getByTestId('joint-status')).toHaveAttribute('data-status', 'accepted');
	await expect(w4.getByTestId('joint-steps')).toContainText('Repair 1 to WPS-002 rev 1');
	await expect(page.locator('[data-count="Repaired"]')).toContainText('1');
});

test('the data book of the half-done demo job: every digest holds, its QR opens the public check', async ({
	page,
	browser
}) => {
	await signIn(page, engineer);
	await page.goto('/jobs');
	await page.getByRole('link', { name: 'JOB-2026-014' }).click();
	await expect(page).toHaveURL(/\/jobs\/\d+$/);
	const panel = page.getByTestId('data-book');
	const saved = page.waitForEvent('download');
	await panel.getByRole('button', { name: 'Compile data book' }).click();
	const download = await saved;
	expect(download.suggestedFilename()).toMatch(/^data-book-JOB-2026-014-.*\.zip$/);
	const book = await readDataBook(await download.path());
	expect(book.mismatches).toEqual([]);
	expect(book.unlisted).toEqual([]);
	const kinds = book.manifest.files.map((f) => f.kind);
	for (const k of ['weld-log', 'procedure-sheet', 'welder-card']) expect(kinds).toContain(k);
	expect(book.qr).toBe(book.manifest.verifyUrl);
	const verifyUrl = new URL(book.qr!);
	expect(verifyUrl.pathname).toMatch(/^\/verify\/[A-Za-z0-9_-]{32}$/);

	await page.reload();
	await expect(panel.getByTestId('data-books')).toContainText(engineer.name);

	// Whoever holds the book checks it, signed in or not.
	const anyone = await (await browser.newContext()).newPage();
	await anyone.goto(verifyUrl.pathname);
	await expect(anyone.getByTestId('book-job')).toHaveText('Job JOB-2026-014');
	await expect(anyone.getByTestId('book-compiled')).toContainText(`by ${engineer.name}`);
	await expect(anyone.getByTestId('book-verdict')).toContainText('Matches');
	await expect(anyone.getByTestId('book-files')).toContainText('weld-map-and-log-JOB-2026-014.pdf');
	// A copy dropped on the check is hashed file by file against what the shop compiled.
	await anyone
		.getByLabel('The data book ZIP or manifest.json')
		.setInputFiles(await download.path());
	await anyone.getByRole('button', { name: 'Check this copy' }).click();
	await expect(anyone.getByTestId('copy-verdict')).toContainText(
		'the very data book the shop compiled'
	);
	await anyone.goto('/verify/no-such-token-000000000000');
	await expect(anyone.getByTestId('book-error')).toBeVisible();
});
