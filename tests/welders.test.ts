import { expect, test, type Page } from '@playwright/test';
import { execFileSync } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { simpleParser } from 'mailparser';
import { isoDay, sixMonthsAfter } from './support/booth';
import { firstLink, waitForMail } from './support/mail';
import { pdfQr, pdfText } from './support/pdf';
import { admin, signIn } from './support/people';

async function acceptInvite(page: Page, link: string, password: string) {
	await page.goto(link);
	await page.getByLabel('Password', { exact: true }).fill(password);
	await page.getByLabel('Password again').fill(password);
	await page.getByRole('button', { name: 'Set password and join' }).click();
	await expect(page).toHaveURL(/\/signin/);
}

test('a welder qualified 3G GTAW, kept current by a tap, checked by the card QR, withdrawn', async ({
	browser
}) => {
	test.setTimeout(90_000);
	const adminPage = await (await browser.newContext()).newPage();
	await signIn(adminPage, admin);

	// A welder who signs in: invited by the admin, password set from the mail.
	const email = `nell-${Date.now()}@larkspur.example`;
	const password = 'a welder at booth four';
	await adminPage.goto('/admin/people');
	const invite = adminPage.getByTestId('invite-form');
	await invite.getByLabel('Name').fill('Nell Carver');
	await invite.getByLabel('E-mail').fill(email);
	await invite.getByTestId('invite-role').selectOption('welder');
	await invite.getByRole('button', { name: 'Send the invite' }).click();
	const welderPage = await (await browser.newContext()).newPage();
	await acceptInvite(welderPage, firstLink((await waitForMail(email)).text), password);

	// The admin adds the welder, linked to that account, and records a 3G GTAW plate test.
	await adminPage.goto('/welders');
	await adminPage.getByRole('link', { name: 'Add a welder' }).click();
	const stamp = `E2E-${Date.now().toString(36).slice(-6)}`;
	await adminPage.getByLabel('Name').fill('Nell Carver');
	await adminPage.getByLabel('Welder ID or stamp').fill(stamp);
	await adminPage.getByLabel('Sign-in account').selectOption({ label: `Nell Carver (${email})` });
	await adminPage.getByRole('button', { name: 'Add the welder' }).click();
	await expect(adminPage).toHaveURL(/\/welders\/\d+$/);
	const welderUrl = adminPage.url();

	const t = new Date();
	const testDate = isoDay(new Date(t.getFullYear(), t.getMonth() - 2, 10));
	await adminPage.getByRole('link', { name: 'Record a qualification' }).click();
	const form = adminPage.getByTestId('qualification-form');
	await form.getByLabel('Process').selectOption('GTAW');
	await form.getByLabel('Test date').fill(testDate);
	await form.getByLabel('WPS followed').fill('WPS-GT-01');
	await form.getByLabel('3G', { exact: true }).check();
	await form.getByLabel('Coupon thickness').fill('3/8');
	await form.getByLabel('Deposited weld metal').fill('3/8');
	await form.getByLabel('Filler classification').fill('ER70S-2');
	await form.getByRole('button', { name: 'Save the qualification' }).click();
	await expect(adminPage).toHaveURL(welderUrl);

	const qual = adminPage.getByTestId('qualification').filter({ hasText: 'GTAW' });
	await expect(qual.getByTestId('range-groove')).toHaveText('F, V'); // ASME IX QW-461.9, 3G
	await expect(qual.getByTestId('range-fillet')).toHaveText('F, H, V'); // ASME IX QW-461.9, 3G
	await expect(qual.getByTestId('lapses-on')).toHaveText(sixMonthsAfter(testDate)); // QW-322.1
	await expect(qual.getByTestId('status')).toHaveAttribute('data-state', 'current');

	// The welder taps "I welded with this today": the six months restart today.
	await signIn(welderPage, { email, password });
	await welderPage.getByRole('link', { name: 'My qualifications' }).click();
	await welderPage.getByTestId('tap-GTAW').click();
	await expect(welderPage.getByTestId('flash')).toContainText('Logged: GTAW today');
	const today = isoDay(new Date());
	await expect(welderPage.getByTestId('lapses-on')).toHaveText(sixMonthsAfter(today));
	await adminPage.reload();
	await expect(qual.getByTestId('lapses-on')).toHaveText(sixMonthsAfter(today));
	await expect(adminPage.getByTestId('use').first()).toContainText('logged at the booth');

	// The wallet card: its text, and its QR code decoded from the rendered page.
	const res = await adminPage.request.get(`${welderUrl}/card?size=wallet`);
	expect(res.status()).toBe(200);
	expect(res.headers()['content-disposition']).toMatch(
		new RegExp(`^attachment; filename="qualification-card-Nell-Carver-${stamp}-wallet\\.pdf"$`)
	);
	const pdf = new Uint8Array(await res.body());
	const text = await pdfText(pdf);
	expect(text).toContain('Nell Carver');
	expect(text).toContain(`current until ${sixMonthsAfter(today)}`);
	const qr = await pdfQr(pdf, 1, 8);
	expect(qr).toMatch(/\/q\/[A-Za-z0-9_-]{24}$/);

	// Anyone who scans sees the live status, not the ranges.
	const visitor = await (await browser.newContext()).newPage();
	await visitor.goto(qr!);
	await expect(visitor.getByTestId('verify-name')).toHaveText('Nell Carver');
	const row = visitor.getByTestId('verify-row').filter({ hasText: 'GTAW' });
	await expect(row.getByTestId('status')).toHaveAttribute('data-state', 'current');
	await expect(visitor.getByTestId('ranges')).toHaveCount(0);
	// A member of the shop opening the same link sees the ranges and the log as well.
	const member = await adminPage.context().newPage();
	await member.goto(qr!);
	await expect(member.getByTestId('verify-name')).toHaveText('Nell Carver');
	await expect(member.getByTestId('ranges').getByTestId('range-groove')).toHaveText('F, V'); // ASME IX QW-461.9, 3G
	await expect(member.getByTestId('use').first()).toContainText('logged at the booth');
	await member.close();

	// The qualification is withdrawn (a failed retest): the scanned card says so at once.
	await adminPage.reload();
	await adminPage.getByText('Withdraw this qualification').click();
	await adminPage
		.getByLabel('Why is the GTAW ASME IX qualification withdrawn?')
		.fill('Failed the bend retest.');
	await adminPage.getByTestId('withdraw-qualification').click();
	await expect(qual.getByTestId('status')).toHaveAttribute('data-state', 'withdrawn');
	await expect(adminPage.getByTestId('withdraw-qualification')).toHaveCount(0);
	await visitor.reload();
	await expect(row.getByTestId('status')).toHaveAttribute('data-state', 'withdrawn');

	// Revoked: the printed card's link now says withdrawn.
	await adminPage.reload();
	await adminPage.getByTestId('revoke-link').click();
	await expect(adminPage.getByTestId('flash')).toContainText('Withdrawn');
	const gone = await visitor.goto(qr!);
	expect(gone?.status()).toBe(410);
	await expect(visitor.getByTestId('verify-withdrawn')).toHaveText('Withdrawn');
});

async function notices(to: string, subject: RegExp): Promise<number> {
	const dir = join(process.env.E2E_DATA_DIR ?? '', 'mail');
	let n = 0;
	for (const f of readdirSync(dir).filter((x) => x.endsWith('.eml'))) {
		const m = await simpleParser(readFileSync(join(dir, f)));
		const rcpt = Array.isArray(m.to) ? m.to.map((a) => a.text).join(',') : (m.to?.text ?? '');
		if (rcpt.includes(to) && subject.test(m.subject ?? '')) n++;
	}
	return n;
}

test('the reminder job sends one 7-day notice for the welder lapsing this week, then none', async () => {
	const dataDir = process.env.E2E_DATA_DIR ?? '';
	const env = {
		...process.env,
		DATA_DIR: dataDir,
		DATABASE_FILE: join(dataDir, 'beadline.sqlite'),
		SMTP_URL: `smtp://127.0.0.1:${process.env.E2E_SMTP_PORT}`,
		ORIGIN: `http://localhost:${process.env.E2E_PORT}`
	};
	const run = () => {
		const out = execFileSync(process.execPath, ['--import', 'tsx', 'scripts/jobs-reminders.ts'], {
			env
		});
		return JSON.parse(out.toString().trim().split('\n').pop() ?? '{}') as { sent: number };
	};
	const seven = /^7-day notice: Priya Venn's GMAW qualification lapses on /;
	run(); // the server's own hourly run may have sent it already: the claim makes that the same
	await waitForMail('priya@larkspur.example', { subject: seven });
	expect(run().sent).toBe(0);
	expect(await notices('priya@larkspur.example', seven)).toBe(1);
});
