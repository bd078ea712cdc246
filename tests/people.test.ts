import { expect, test } from '@playwright/test';
import { firstLink, waitForMail } from './support/mail';
import { admin, otherAdmin, signIn } from './support/people';

test('an admin invites an engineer who sets a password once and signs in', async ({
	page,
	browser
}) => {
	const email = `new.engineer.${Date.now()}@larkspur.example`;
	const started = Date.now();
	await signIn(page, admin);
	await page.goto('/admin/people');
	const form = page.getByTestId('invite-form');
	await form.getByLabel('Name').fill('Wren Adeyemi');
	await form.getByLabel('E-mail').fill(email);
	await form.getByTestId('invite-role').selectOption('engineer');
	await form.getByRole('button').click();
	await expect(page.getByTestId('invite-row').filter({ hasText: email })).toBeVisible();

	const mail = await waitForMail(email, { after: started - 1000 });
	expect(mail.subject).toContain('Larkspur Trailer & Rail');
	const link = firstLink(mail.text);

	const guest = await browser.newPage();
	await guest.goto(link);
	const accept = guest.getByTestId('invite-accept-form');
	await accept.getByLabel('Password', { exact: true }).fill('a-long-enough-secret');
	await accept.getByLabel(/Confirm|again/i).fill('a-long-enough-secret');
	await accept.getByRole('button').click();
	await expect(guest).toHaveURL(/\/signin\?welcome/);
	await signIn(guest, { email, password: 'a-long-enough-secret' });
	await expect(guest).toHaveURL(/\/records$/);

	// The link works once.
	const again = await guest.goto(link);
	expect(again?.status()).toBe(410);
	await expect(guest.getByTestId('invite-gone')).toBeVisible();
	await guest.close();
});

test('a disabled member is signed out at their next request', async ({ page, browser }) => {
	const email = `short.lived.${Date.now()}@larkspur.example`;
	const started = Date.now();
	await signIn(page, admin);
	await page.goto('/admin/people');
	const form = page.getByTestId('invite-form');
	await form.getByLabel('Name').fill('Short Lived');
	await form.getByLabel('E-mail').fill(email);
	await form.getByTestId('invite-role').selectOption('welder');
	await form.getByRole('button').click();
	const link = firstLink((await waitForMail(email, { after: started - 1000 })).text);

	const member = await browser.newPage();
	await member.goto(link);
	await member
		.getByTestId('invite-accept-form')
		.getByLabel('Password', { exact: true })
		.fill('welder-password-1');
	await member
		.getByTestId('invite-accept-form')
		.getByLabel(/Confirm|again/i)
		.fill('welder-password-1');
	await member.getByTestId('invite-accept-form').getByRole('button').click();
	await signIn(member, { email, password: 'welder-password-1' });

	await page.goto('/admin/people');
	await page.getByTestId('person-row').filter({ hasText: email }).getByRole('link').first().click();
	await page.getByTestId('disable-person').click();
	await expect(page.getByTestId('person-active')).toContainText(/disabled|no/i);

	await member.goto('/booth');
	await expect(member).toHaveURL(/\/signin/);
	await member.close();
});

test("another shop's admin gets 404 for this shop's people and admin pages show only their own", async ({
	page
}) => {
	// Find a Larkspur person id as Larkspur's admin…
	await signIn(page, admin);
	await page.goto('/admin/people');
	const href = await page
		.getByTestId('person-row')
		.first()
		.getByRole('link')
		.first()
		.getAttribute('href');
	expect(href).toMatch(/^\/admin\/people\/[0-9a-f-]{36}$/);
	await page.getByRole('button', { name: 'Sign out' }).click();

	// …then ask for it as Harrow Gate's admin.
	await signIn(page, otherAdmin);
	const res = await page.goto(href!);
	expect(res?.status()).toBe(404);
	await page.goto('/admin/people');
	await expect(page.getByTestId('person-row').filter({ hasText: 'larkspur.example' })).toHaveCount(
		0
	);
});

test('an API token answers the checks API until it is revoked', async ({ page, request }) => {
	await signIn(page, admin);
	await page.goto('/admin/tokens');
	await page.getByTestId('token-form').getByLabel('Name').fill('Bench tablet');
	await page.getByTestId('token-form').getByRole('button').click();
	const secret = (await page.getByTestId('token-secret').textContent())?.trim() ?? '';
	expect(secret).toMatch(/^bl_/);

	const body = { process: 'GTAW', amps: 125, thickness: { value: 0.125, unit: 'in' } };
	const headers = { authorization: `Bearer ${secret}` };
	const ok = await request.post('/api/v1/checks', { data: body, headers });
	expect(ok.status()).toBe(200);
	expect((await ok.json()).findings.length).toBeGreaterThan(0);
	expect((await request.post('/api/v1/checks', { data: body })).status()).toBe(401);

	await page.goto('/admin/tokens');
	await page
		.getByTestId('token-row')
		.filter({ hasText: 'Bench tablet' })
		.getByTestId('revoke-token')
		.click();
	await expect(page.getByTestId('token-row').filter({ hasText: 'Bench tablet' })).toContainText(
		'Revoked'
	);
	expect((await request.post('/api/v1/checks', { data: body, headers })).status()).toBe(401);
});
