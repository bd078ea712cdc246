import { expect, test } from '@playwright/test';
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { openSqlite } from '../scripts/lib/sqlite-file';
import { DEMO_SHOP } from './support/demo-params';
import { engineer, otherAdmin, signIn, welder } from './support/people';

// The list, export, compare and plot on the seeded demo records, and who may do what.

test('filters narrow the table and live in the URL; the CSV holds exactly those rows', async ({
	page
}) => {
	await signIn(page, engineer);
	await page.goto('/records');
	const all = Number(await page.getByTestId('records-count').locator('strong').textContent());
	await page.getByTestId('filters').locator('summary').click();
	await page.getByLabel('Process').selectOption('GMAW');
	await page.getByLabel('Thickness from (in)').fill('1/8');
	await page.getByLabel('Thickness to (in)').fill('1/4');
	await page.getByRole('button', { name: 'Apply filters' }).click();
	await expect(page).toHaveURL(/process=GMAW/);
	await expect(page).toHaveURL(/tmin=1%2F8/);
	await expect(page).toHaveURL(/tmax=1%2F4/);
	const total = Number(await page.getByTestId('records-count').locator('strong').textContent());
	expect(total).toBeGreaterThan(0);
	expect(total).toBeLessThan(all);
	const rows = page.getByTestId('record-row');
	await expect(rows).toHaveCount(Math.min(total, 25));
	for (const p of await rows.locator('[data-col="process"]').allTextContents())
		expect(p).toBe('GMAW');
	const shown = await rows.evaluateAll((els) => els.map((e) => e.getAttribute('data-id')));

	const download = page.waitForEvent('download');
	await page.getByTestId('export-csv').click();
	const csv = await readFile((await (await download).path()) ?? '', 'utf8');
	const lines = csv
		.replace(/^\uFEFF/, '')
		.trim()
		.split('\r\n');
	expect(lines[0]).toContain('thickness (in)');
	const data = lines.slice(1).map((l) => l.split(','));
	expect(data.length).toBe(total);
	expect(data.map((c) => c[0]).sort()).toEqual([...shown].sort());
	for (const c of data) {
		expect(c[2]).toBe('GMAW');
		const t = Number(c[18]);
		expect(t).toBeGreaterThanOrEqual(0.125);
		expect(t).toBeLessThanOrEqual(0.25);
	}
});

test('compare marks the fields that differ; the plot has a point per filtered record', async ({
	page
}) => {
	await signIn(page, engineer);
	await page.goto('/records?process=GMAW&tmin=1/8&tmax=1/4&sort=amps&dir=asc');
	const boxes = page.getByTestId('record-row').getByRole('checkbox');
	await boxes.first().check();
	await boxes.last().check();
	await page.getByRole('button', { name: /Compare selected/ }).click();
	await expect(page).toHaveURL(/\/records\/compare\?ids=\d+&ids=\d+/);
	await expect(page.locator('[data-testid="compare-row"][data-key="amps"]')).toHaveAttribute(
		'data-differs',
		'true'
	);
	await expect(page.locator('[data-testid="compare-row"][data-key="process"]')).toHaveAttribute(
		'data-differs',
		'false'
	);

	await page.goto('/records/plot?process=GMAW&tmin=1/8&tmax=1/4');
	const total = Number(await page.getByTestId('plot-count').locator('strong').textContent());
	expect(total).toBeGreaterThan(0);
	await expect(page.getByTestId('plot-point')).toHaveCount(total);
	await expect(page.getByTestId('plot-band')).toHaveCount(1);
	await page.getByTestId('plot-point').first().click();
	await expect(page).toHaveURL(/\/records\/\d+$/);
});

test('a welder cannot create or edit records; another shop gets 404 for the same id', async ({
	page,
	browser
}) => {
	await signIn(page, engineer);
	await page.goto('/records');
	const id = await page.getByTestId('record-row').first().getAttribute('data-id');
	const created = await page.request.post('/api/v1/settings', {
		data: {
			process: 'GTAW',
			amps: 250,
			thickness: { value: 0.125, unit: 'in' },
			baseMetal: { spec: 'A36' },
			weldedOn: '2025-06-01'
		}
	});
	expect(created.status()).toBe(201);
	const body = await created.json();
	expect(
		body.findings.some(
			(f: { field?: string; status: string }) => f.field === 'amps' && f.status !== 'ok'
		)
	).toBe(true);
	const bad = await page.request.patch(`/api/v1/settings/${body.id}`, {
		data: { thickness: 'thick' }
	});
	expect(bad.status()).toBe(400);
	expect((await bad.json()).errors.thickness).toBeTruthy();

	const w = await browser.newPage();
	await signIn(w, welder);
	expect((await w.goto('/records/new'))?.status()).toBe(403);
	expect((await w.goto(`/records/${id}/edit`))?.status()).toBe(403);
	const post = await w.request.post('/api/v1/settings', {
		data: { process: 'GTAW', weldedOn: '2025-06-01' }
	});
	expect(post.status()).toBe(403);
	const patch = await w.request.patch(`/api/v1/settings/${id}`, { data: { amps: 100 } });
	expect(patch.status()).toBe(403);
	await w.close();

	const o = await browser.newPage();
	await signIn(o, otherAdmin);
	expect((await o.goto(`/records/${id}`))?.status()).toBe(404);
	expect((await o.request.get(`/api/v1/settings/${id}`)).status()).toBe(404);
	expect((await o.request.get(`/records/${id}/photos/1`)).status()).toBe(404);
	await o.close();
});

test('a record a demo procedure cites is frozen: no edit, and its edit URL answers 409', async ({
	page
}) => {
	const db = await openSqlite(join(process.env.E2E_DATA_DIR ?? '', 'beadline.sqlite'), {
		readonly: true
	});
	const cited = await db
		.get<{ id: number }>(
			`SELECT r.id FROM settings_records r JOIN shops s ON s.id = r.shop_id
			 WHERE s.name = ? AND r.cited_by_procedure_id IS NOT NULL ORDER BY r.id LIMIT 1`,
			[DEMO_SHOP]
		)
		.finally(() => db.close());
	expect(cited, 'the demo seed cites records from its procedures').toBeTruthy();
	await signIn(page, engineer);
	await page.goto(`/records/${cited?.id}`);
	await expect(page.getByTestId('frozen')).toContainText('cites this record');
	await expect(page.getByRole('link', { name: 'Edit', exact: true })).toHaveCount(0);
	expect((await page.goto(`/records/${cited?.id}/edit`))?.status()).toBe(409);
	await expect(page.getByText(/frozen and can no longer be edited/)).toBeVisible();
});
