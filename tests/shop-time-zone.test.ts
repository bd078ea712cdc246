import { expect, test } from '@playwright/test';
import { signIn } from './support/people';

// A shop of its own (signed up here), so changing its zone moves no other test's "today".
test('an admin names the shop’s time zone; the trail reads its clock', async ({ page }) => {
	const who = {
		email: `zone-${Date.now().toString(36)}@quillmere.example`,
		password: 'long enough passphrase 41'
	};
	await page.goto('/signup');
	await page.getByLabel('Shop name').fill('Quillmere Zone Works');
	await page.getByLabel('Your name').fill('Odile Marsh');
	await page.getByLabel('E-mail').fill(who.email);
	await page.getByLabel('Password', { exact: true }).fill(who.password);
	await page.getByLabel('Password again').fill(who.password);
	await page.getByRole('button', { name: 'Create the shop' }).click();
	await page.waitForURL(/\/signin/);
	await signIn(page, who);

	await page.goto('/admin/shop');
	const zone = page.getByLabel('Shop time zone');
	await zone.selectOption('America/Chicago');
	await page.getByRole('button', { name: 'Save' }).click();
	await expect(page.getByText('Shop settings saved.')).toBeVisible();
	await page.reload();
	await expect(zone).toHaveValue('America/Chicago');

	await page.goto('/admin/audit');
	const change = page.getByText(/time zone: .+ → America\/Chicago/i).first();
	await expect(change).toBeVisible();
	// The moments of this shop's trail are on its clock, the zone named.
	await expect(page.locator('time', { hasText: 'America/Chicago' }).first()).toBeVisible();
});
