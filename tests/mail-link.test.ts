import { expect, test, type Page } from '@playwright/test';
import { countMail, firstLink, waitForMail } from './support/mail';
import { admin, engineer, signIn } from './support/people';

// Sign-in by e-mail link through the local mail catcher, and the product's own error pages.

async function askForLink(page: Page, email: string): Promise<string> {
	await page.goto('/signin');
	const send = page.getByRole('button', { name: 'Send me a sign-in link' });
	const form = page.locator('form').filter({ has: send });
	// By name: the two forms' E-mail fields share the id f-email, so this label names the other.
	await form.locator('input[name="email"]').fill(email);
	await send.click();
	await expect(page).toHaveURL(/\/signin\/check-mail/);
	return (await page.getByRole('status').textContent())?.trim() ?? '';
}

test('an e-mail link signs a member in; the admin sees it among the caught mail', async ({
	page,
	browser
}) => {
	const started = Date.now();
	expect(await askForLink(page, engineer.email)).toContain('Check your mail');
	const mail = await waitForMail(engineer.email, {
		subject: /sign-in link/,
		after: started - 1000
	});
	await page.goto(firstLink(mail.text));
	await expect(page.getByTestId('whoami')).toBeVisible();
	await expect(page).toHaveURL(/\/records$/); // the engineer's start page

	const a = await browser.newPage();
	await signIn(a, admin);
	await a.goto('/admin/mail');
	const item = a
		.getByTestId('mail-item')
		.filter({ hasText: 'Your Beadline sign-in link' })
		.filter({ has: a.getByTestId('mail-to').getByText(engineer.email) });
	await expect(item.first()).toBeVisible();
	await a.close();
});

test('an unknown e-mail sees the same page as a member and gets no mail', async ({ page }) => {
	const started = Date.now();
	const unknown = `nobody-${started}@larkspur.example`;
	const forUnknown = await askForLink(page, unknown);
	expect(forUnknown).toBe(await askForLink(page, engineer.email));
	await waitForMail(engineer.email, { subject: /sign-in link/, after: started });
	// Mail goes out in the order asked for, so the member's arriving means none went to the other.
	expect(await countMail(unknown)).toBe(0);
});

/** What a stack trace or a server path would look like on a page. */
const LEAKS = /\bat \S+ \(|\.(ts|js):\d+|node_modules|\/work\/|\/src\/lib\/|Error:/;

test('a missing page and an unknown id show the product’s error page, with no stack trace', async ({
	page
}) => {
	const missing = await page.goto('/no-such-page-here');
	expect(missing?.status()).toBe(404);
	await expect(page.getByRole('heading', { name: 'Nothing here' })).toBeVisible();
	await expect(page.getByText(/Reference for your admin: [0-9a-f]{8}/)).toBeVisible();
	expect(await page.locator('body').innerText()).not.toMatch(LEAKS);

	await signIn(page, engineer);
	const unknown = await page.goto('/records/987654321');
	expect(unknown?.status()).toBe(404);
	await expect(page.getByRole('heading', { name: 'Nothing here' })).toBeVisible();
	await expect(page.getByText('No such settings record in your shop.')).toBeVisible();
	expect(await page.locator('body').innerText()).not.toMatch(LEAKS);
});

test('a form body the server cannot read is refused with 400 and the product’s page, never a 500', async ({
	page,
	baseURL
}) => {
	// The generic 5xx page itself (one line and a reference) is unit-tested in
	// src/lib/server/public-error.test.ts: no route exists to fail on purpose.
	const res = await page.request.post('/signin?/password', {
		headers: {
			accept: 'text/html',
			origin: baseURL ?? '',
			'content-type': 'multipart/form-data; boundary=no-parts-here'
		},
		data: 'not multipart at all'
	});
	expect(res.status()).toBe(400);
	const html = await res.text();
	const main = html.match(/<main[\s\S]*<\/main>/)?.[0].replace(/<[^>]+>/g, ' ') ?? '';
	expect(main).toContain('The form could not be read.');
	expect(main).not.toMatch(LEAKS);
	expect(html).not.toMatch(/node_modules|\/work\/|\bat \S+ \(/);
});
