import { expect, type Page } from '@playwright/test';
import { DEMO_PEOPLE, OTHER_PEOPLE, type DemoPerson } from '../../src/lib/server/seed/demo-people';

export function person(email: string): DemoPerson {
	const p = [...DEMO_PEOPLE, ...OTHER_PEOPLE].find((x) => x.email === email);
	if (!p) throw new Error(`No demo person ${email}`);
	return p;
}

export const admin = person('dana@larkspur.example');
export const engineer = person('reuben@larkspur.example');
export const inspector = person('mirela@larkspur.example');
export const welder = person('tomas@larkspur.example');
export const otherAdmin = person('ines@harrowgate.example');

export async function signIn(page: Page, who: { email: string; password: string }): Promise<void> {
	await page.goto('/signin');
	await page.getByLabel('E-mail').first().fill(who.email);
	await page.getByLabel('Password').fill(who.password);
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page.getByTestId('whoami')).toBeVisible();
}
