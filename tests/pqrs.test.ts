import { expect, test } from '@playwright/test';
import { engineer, inspector, signIn } from './support/people';
import { uniqueNumber } from './support/procedures';

test.describe.configure({ timeout: 60_000 });

const PDF = Buffer.from('%PDF-1.4\n1 0 obj <<>> endobj\ntrailer <<>>\n%%EOF\n');
const PNG = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0]);

test('a PQR computes what it qualifies, takes a PDF lab report only, and freezes when certified', async ({
	page,
	browser
}) => {
	await signIn(page, engineer);
	await page.goto('/pqrs/new');
	const number = uniqueNumber('PQR');
	await page.getByLabel('Number').fill(number);
	await page.getByLabel('Title').fill('GTAW A36 3/8 in plate');
	await page.getByLabel('Current and polarity').selectOption('DCEN');
	await page.getByLabel('Filler classification').fill('ER70S-6');
	await page.getByLabel('Base metal').fill('A36');
	await page.getByLabel('Test position').selectOption('3G');
	await page.getByLabel('Amperage').fill('130');
	await page.getByLabel('Coupon thickness T').fill('3/8');
	await page.getByTestId('test-tensile').getByLabel('Result').selectOption('pass');
	await page.getByLabel('Specimen 1 strength').fill('72500');
	await page.getByTestId('save-pqr').click();
	await expect(page).toHaveURL(/\/pqrs\/\d+\?done=saved$/);
	// QW-451.1: T = 3/8 in qualifies 1/16 in to 2T = 3/4 in; QW-461.9: 3G covers fillet F, H, V.
	await expect(page.getByTestId('qualified-thickness')).toContainText('1/16 in – 3/4 in');
	await expect(page.getByTestId('qualified-positions')).toContainText('fillet F, H, V');
	await expect(page.getByTestId('test-tensile')).toContainText('72,500 psi');

	const upload = async (name: string, buffer: Buffer) => {
		await page
			.getByLabel(/Add a lab report/)
			.setInputFiles({ name, mimeType: 'application/pdf', buffer });
		await page.getByRole('button', { name: 'Upload' }).click();
	};
	await upload('report.pdf', PNG);
	await expect(page.getByTestId('report-error')).toContainText('not a PDF');
	await upload('lab report.pdf', PDF);
	await expect(page.getByTestId('report-link')).toHaveText('lab report.pdf');
	const file = await page.request.get(
		(await page.getByTestId('report-link').getAttribute('href')) ?? ''
	);
	expect(file.headers()['content-type']).toBe('application/pdf');
	expect(file.headers()['content-disposition']).toContain('attachment');
	expect(file.headers()['x-content-type-options']).toBe('nosniff');
	expect(Buffer.compare(await file.body(), PDF)).toBe(0);

	const id = new URL(page.url()).pathname.split('/')[2];
	const ins = await (await browser.newContext()).newPage();
	await signIn(ins, inspector);
	expect((await ins.request.post(`/api/v1/pqrs/${id}/certify`, { data: {} })).status()).toBe(403);

	await page.getByTestId('certify').click();
	await expect(page.getByTestId('certified')).toContainText('Certified by Reuben Castell');
	await page.goto(`/pqrs/${id}/edit`);
	await expect(page.getByTestId('edit-refused')).toContainText('certified and frozen');
	await page.goto(`/pqrs/${id}`);
	await page.getByLabel('Record a correction').fill('Specimen 1 was 72,600 psi.');
	await page.getByRole('button', { name: 'Add the addendum' }).click();
	await expect(page.getByTestId('addenda')).toContainText('72,600 psi');
	await expect(
		page.locator('[data-testid=trail-entry][data-action="pqr.addendum_added"]')
	).toBeVisible();
	await expect(
		page.locator('[data-testid=trail-entry][data-action="pqr_report.downloaded"]')
	).toBeVisible();
});
