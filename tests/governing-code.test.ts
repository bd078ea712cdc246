import { expect, test } from '@playwright/test';
import { boothToken, procedureId } from './support/booth';
import { inspector, otherAdmin, signIn } from './support/people';
import { sqlGet, uniqueNumber } from './support/procedures';

// Issue 15: people choose the governing code (the shop's default, then each PQR, WPS and
// qualification), and each procedure is judged by its own code, saying so where Beadline has no
// rule of that code. Data: the demo seed (WPS-002 claims AWS D1.1; WPS-ISO-01 and PQR-ISO-01).
test.describe.configure({ timeout: 60_000 });

test('the shop sets its default code; new PQRs and procedures start from it; a coupon to both codes shows both', async ({
	page
}) => {
	// Harrow Gate, not the demo shop: the other journeys keep Larkspur's ASME IX default.
	await signIn(page, otherAdmin);
	await page.goto('/admin/shop');
	const select = page.getByLabel('Governing code new work starts from');
	await expect(select).toHaveValue('asme-ix');
	await select.selectOption('iso-15614-1');
	await expect(select).toHaveValue('iso-15614-1');
	await page.getByRole('button', { name: 'Save' }).click();
	await expect(page.getByText('Shop settings saved.')).toBeVisible();
	await page.reload();
	await expect(select).toHaveValue('iso-15614-1');

	await page.goto('/procedures/new');
	await expect(page.getByLabel('Code it follows')).toHaveValue('iso-15609-1');
	await page.goto('/pqrs/new');
	await expect(page.getByLabel('Code it is qualified to')).toHaveValue('iso-15614-1');

	// One coupon qualified to both codes: the two result sets side by side.
	const number = uniqueNumber('PQR-BOTH');
	await page.getByLabel('Number').fill(number);
	await page.getByLabel('Title').fill('GTAW 3/8 in plate to ASME IX and ISO 15614-1');
	await page.getByLabel('Current and polarity').selectOption('DCEN');
	await page.getByLabel('Base metal').fill('A36');
	await page.getByLabel('Test position').selectOption('3G');
	await page.getByLabel('Coupon thickness T').fill('3/8');
	const code = page.getByLabel('Code it is qualified to');
	await code.selectOption('asme-ix+iso');
	await expect(code).toHaveValue('asme-ix+iso');
	await page.getByTestId('save-pqr').click();
	await expect(page).toHaveURL(/\/pqrs\/\d+\?done=saved$/);
	await expect(page.getByText('ASME IX and ISO 15614-1 (one coupon, both codes)')).toBeVisible();
	const both = page.getByTestId('both-codes');
	await expect(both.getByTestId('code-set-asme')).toContainText('What it qualifies by ASME IX');
	// QW-451.1: T = 3/8 in qualifies 1/16 in to 2T = 3/4 in.
	await expect(both.getByTestId('qualified-thickness')).toContainText('1/16 in – 3/4 in');
	await expect(both.getByTestId('code-set-iso')).toContainText('What it qualifies by ISO 15614-1');
	const stored = await sqlGet<{ code: string }>('SELECT code FROM pqrs WHERE number = ?', [number]);
	expect(stored?.code).toBe('asme-ix+iso');

	await page.goto('/admin/shop');
	await page.getByLabel('Governing code new work starts from').selectOption('asme-ix');
	await page.getByRole('button', { name: 'Save' }).click();
	await expect(page.getByText('Shop settings saved.')).toBeVisible();
});

test('WPS-002 (AWS D1.1) is judged by D1.1 on its review screen, and says where D1.1 has no rule', async ({
	page
}) => {
	await signIn(page, inspector);
	await page.goto(`/procedures/${await procedureId('WPS-002')}/revisions/2/review`);
	await expect(page.getByTestId('judged-by')).toContainText('Judged by AWS D1.1.');
	await expect(page.getByTestId('judged-by')).toContainText('no ASME IX rule is applied');
	// D1.1 Table 4.2, not ASME IX QW-403.10, for the short-circuit coupon's thickness.
	const thickness = page.getByTestId('findings-thickness');
	await expect(thickness).toContainText('D1.1 Table 4.2');
	await expect(thickness).not.toContainText('QW-403.10');
	await expect(page.getByTestId('findings-positions')).toContainText('D1.1 Table 4.1');
	await expect(page.getByTestId('findings-positions')).not.toContainText('QW-461.9');
	// AWS D1.1:2015 Table 4.5: GMAW voltage beyond 7 % of the PQR's needs a new PQR.
	await expect(page.getByTestId('findings-volts')).toContainText('beyond 7 % for GMAW');
	await expect(page.getByTestId('findings-travelSpeed')).toContainText(
		'No D1.1 rule modelled for this variable (travel speed)'
	);
	await expect(page.getByTestId('findings-pNumbers')).toContainText(
		'No D1.1 rule modelled for this variable'
	);
	// Its coupon, PQR-002, follows D1.1 too: its D1.1 set beside the ASME IX one.
	await page.getByRole('link', { name: 'PQR-002' }).first().click();
	const d11 = page.getByTestId('both-codes').getByTestId('code-set-d11');
	await expect(d11).toContainText('What it qualifies by AWS D1.1');
	// AWS D1.1:2015 Table 4.2 as recalled: a 3/8 in test plate qualifies 1/8 in to 2T = 3/4 in.
	await expect(d11).toContainText('1/8 in – 3/4 in');
});

test('WPS-ISO-01 is an approved ISO WPS backed by PQR-ISO-01, judged by ISO 15614-1, with a booth link', async ({
	page
}) => {
	await signIn(page, inspector);
	const id = await procedureId('WPS-ISO-01');
	await page.goto(`/procedures/${id}/revisions/1/review`);
	await expect(page.getByTestId('judged-by')).toContainText('Judged by ISO 15614-1');
	await expect(page.getByTestId('findings-thickness')).toContainText('ISO 15614-1 Table 7');
	await expect(page.getByTestId('findings-gasName')).toContainText(
		'ISO 15614-1 8.5.2.1 / 8.5.3.1 governs this variable'
	);
	await page.goto(`/procedures/${id}/revisions/1`);
	await expect(page.getByTestId('judged-by')).toContainText('Judged by ISO 15614-1');
	await page.getByRole('link', { name: 'PQR-ISO-01' }).first().click();
	await expect(page.getByTestId('both-codes')).toBeVisible();
	await page.goto(`/b/${await boothToken('WPS-ISO-01', 1)}`);
	await expect(page.getByTestId('booth-number')).toHaveText('WPS-ISO-01');
});
