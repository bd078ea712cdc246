import { expect, test } from '@playwright/test';
import { admin, engineer, inspector, person, signIn, welder } from './support/people';

const START = [
	{
		who: admin,
		path: '/admin',
		sees: ['Overview', 'People', 'Shop'],
		hidden: ['Bench records', 'Booth']
	},
	{ who: engineer, path: '/records', sees: ['Bench records'], hidden: ['People', 'Review desk'] },
	{ who: inspector, path: '/reviews', sees: ['Review desk'], hidden: ['People', 'Bench records'] },
	{
		who: welder,
		path: '/booth',
		sees: ['Booth'],
		hidden: ['People', 'Bench records', 'Review desk']
	}
];

for (const { who, path, sees, hidden } of START) {
	test(`${who.role} lands on ${path} and sees only their navigation`, async ({ page }) => {
		await signIn(page, who);
		await expect(page).toHaveURL(new RegExp(`${path}$`));
		const nav = page.getByRole('navigation', { name: 'Main' });
		for (const label of sees) await expect(nav.getByRole('link', { name: label })).toBeVisible();
		for (const label of hidden) await expect(nav.getByRole('link', { name: label })).toHaveCount(0);
	});
}

test('a welder opening an admin page gets 403', async ({ page }) => {
	await signIn(page, welder);
	const res = await page.goto('/admin/people');
	expect(res?.status()).toBe(403);
	await expect(page.getByRole('heading', { name: 'Not for your role' })).toBeVisible();
});

test('signed-out visitors are sent to sign in and come back after', async ({ page }) => {
	await page.goto('/admin/shop');
	await expect(page).toHaveURL(/\/signin\?redirectTo=%2Fadmin%2Fshop/);
	await page.getByLabel('E-mail').first().fill(admin.email);
	await page.getByLabel('Password').fill(admin.password);
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page).toHaveURL(/\/admin\/shop$/);
});

test('a wrong password and an unknown e-mail show the same generic message', async ({ page }) => {
	const messages: string[] = [];
	// Colm signs in nowhere else with a password, so his per-e-mail limit is untouched here.
	for (const email of [person('colm@harrowgate.example').email, 'nobody@larkspur.example']) {
		await page.goto('/signin');
		await page.getByLabel('E-mail').first().fill(email);
		await page.getByLabel('Password').fill('not-the-password');
		await page.getByRole('button', { name: 'Sign in' }).click();
		messages.push((await page.getByTestId('signin-error').textContent())?.trim() ?? '');
	}
	expect(messages[0]).toContain('do not match');
	expect(messages[1]).toBe(messages[0]);
	// The typed e-mail is kept; the password is not sent back.
	await expect(page.getByLabel('E-mail').first()).toHaveValue('nobody@larkspur.example');
	await expect(page.getByLabel('Password')).toHaveValue('');
});

test('20 wrong passwords in a row are throttled', async ({ page }) => {
	test.setTimeout(120_000);
	// Priya is used by no other test, so throttling her account does not disturb the suite.
	const target = person('priya@larkspur.example');
	let throttled = false;
	for (let i = 0; i < 20 && !throttled; i++) {
		await page.goto('/signin');
		await page.getByLabel('E-mail').first().fill(target.email);
		await page.getByLabel('Password').fill(`wrong-${i}`);
		await page.getByRole('button', { name: 'Sign in' }).click();
		throttled = /Too many attempts/.test(
			(await page.getByTestId('signin-error').textContent()) ?? ''
		);
	}
	expect(throttled).toBe(true);
	// Even the right password is refused while throttled.
	await page.getByLabel('Password').fill(target.password);
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page.getByTestId('signin-error')).toContainText('Too many attempts');
});

test('signed-in pages are not cached and carry the security headers', async ({ page }) => {
	await signIn(page, admin);
	const res = await page.goto('/admin');
	const h = res?.headers() ?? {};
	expect(h['cache-control']).toContain('no-store');
	expect(h['x-content-type-options']).toBe('nosniff');
	expect(h['referrer-policy']).toBe('same-origin');
	expect(h['content-security-policy']).toContain("frame-ancestors 'none'");
});
