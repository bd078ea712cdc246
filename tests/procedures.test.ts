import { expect, test, type Page } from '@playwright/test';
import { waitForMail } from './support/mail';
import { engineer, inspector, signIn } from './support/people';
import { uniqueNumber } from './support/procedures';

// The whole life of a procedure, as the first "done when" describes it.
test.describe.configure({ mode: 'serial' });

async function record(page: Page, amps: number, thickness: number, position: string) {
	const res = await page.request.post('/api/v1/settings', {
		data: {
			process: 'GTAW',
			currentType: 'DCEN',
			amps,
			volts: 12,
			thickness: { value: thickness, unit: 'in' },
			baseMetal: { spec: 'A36' },
			filler: { classification: 'ER70S-6', diameter: { value: 0.09375, unit: 'in' } },
			gas: { name: 'argon', flow: { value: 20, unit: 'CFH' } },
			position,
			jointType: 'tee',
			outcome: 'sound',
			weldedOn: '2025-06-02'
		}
	});
	expect(res.status()).toBe(201);
	return ((await res.json()) as { id: number }).id;
}

async function approve(page: Page, path: string) {
	await page.goto(`${path}/review`);
	await page.getByLabel('Your password').fill(inspector.password);
	await page.getByTestId('approve').click();
	await expect(page.getByTestId('state').first()).toHaveAttribute('data-state', 'approved');
}

test('a draft from two records is reviewed, returned, fixed, signed, frozen and superseded', async ({
	browser
}) => {
	test.setTimeout(120_000);
	const eng = await (await browser.newContext()).newPage();
	const ins = await (await browser.newContext()).newPage();
	await signIn(eng, engineer);
	await signIn(ins, inspector);

	// Two bench records; the draft's ranges must span them.
	const a = await record(eng, 118, 0.125, '2F');
	const b = await record(eng, 132, 0.1875, '1F');
	await eng.goto(`/procedures/new?records=${a},${b}`);
	const number = uniqueNumber('J');
	await eng.getByLabel('Number').fill(number);
	await eng.getByLabel('Title').fill('GTAW A36 fillet from the bench');
	await expect(eng.locator(`[data-testid=pick-record][data-id="${a}"]`)).toBeChecked();
	await expect(eng.locator(`[data-testid=pick-record][data-id="${b}"]`)).toBeChecked();
	await eng.getByRole('button', { name: 'Create the draft' }).click();
	await expect(eng).toHaveURL(/\/revisions\/1\/edit\?created=1$/);
	await expect(eng.getByLabel('Amperage, from')).toHaveValue('118 A');
	await expect(eng.getByLabel('Amperage, to')).toHaveValue('132 A');
	await expect(eng.getByLabel('Base metal thickness, from')).toHaveValue('1/8 in');
	await expect(eng.getByLabel('Base metal thickness, to')).toHaveValue('3/16 in');
	await expect(eng.getByRole('checkbox', { name: '2F' })).toBeChecked();
	await eng.getByRole('checkbox', { name: /PQR-001/ }).check();
	await eng.getByTestId('save-draft').click();
	await expect(eng.getByTestId('flash').first()).toContainText('Draft saved');
	const path = new URL(eng.url()).pathname;
	await expect(eng.getByTestId('revision-records')).toContainText(`#${a}`);
	await eng.getByTestId('submit-revision').click();
	await expect(eng.getByTestId('state').first()).toHaveAttribute('data-state', 'in-review');

	// The inspector's queue, the findings beside the values, and a return with a comment.
	await waitForMail(inspector.email, { subject: new RegExp(`Review requested: ${number}`) });
	await ins.goto('/reviews');
	const item = ins.locator(`[data-testid=queue-item][data-number="${number}"]`);
	await expect(item).toBeVisible();
	await item.getByRole('link', { name: 'Review' }).click();
	await expect(ins.getByTestId('findings-amps').getByTestId('finding').first()).toBeVisible();
	await expect(ins.getByTestId('findings-thickness')).toContainText('PQR-001');
	await ins.getByTestId('return').click();
	await expect(ins.getByText('a comment is required to return')).toBeVisible();
	await ins.getByLabel('What needs to change').fill('Give the travel speed range.');
	await ins.getByTestId('return').click();
	await expect(ins).toHaveURL(/\/reviews\?done=returned/);

	// The author's mail, the fix, and the second submission.
	const returned = await waitForMail(engineer.email, {
		subject: new RegExp(`Returned with comments: ${number}`)
	});
	expect(returned.text).toContain('Give the travel speed range.');
	await eng.goto(`${path}/edit`);
	await expect(eng.getByTestId('return-comment')).toContainText('travel speed');
	await eng.getByLabel('Travel speed, from').fill('3');
	await eng.getByLabel('Travel speed, to').fill('5');
	await eng.getByTestId('save-draft').click();
	await eng.getByTestId('submit-revision').click();
	await expect(eng.getByTestId('state').first()).toHaveAttribute('data-state', 'in-review');

	// Signed with the password; the author hears of it; the revision is frozen.
	await approve(ins, path);
	await expect(ins.getByTestId('sign-off').filter({ hasText: 'Approved' })).toContainText(
		'Mirela Sand, Inspector'
	);
	await waitForMail(engineer.email, { subject: new RegExp(`Approved: ${number} revision 1`) });
	await eng.goto(`${path}/edit`);
	await expect(eng.getByTestId('edit-refused')).toContainText(
		'approved and signed; it can no longer be edited'
	);

	// A new revision, once approved, supersedes it.
	await eng.goto(path);
	await eng.getByTestId('new-revision').click();
	await expect(eng).toHaveURL(/\/revisions\/2\/edit\?created=1$/);
	await eng.getByLabel('Amperage, to').fill('135');
	await eng.getByTestId('save-draft').click();
	await eng.getByTestId('submit-revision').click();
	// In review before the inspector opens it (else the review page may show the draft).
	await expect(eng.getByTestId('state').first()).toHaveAttribute('data-state', 'in-review');
	await approve(ins, path.replace(/\/1$/, '/2'));
	await eng.goto(path);
	await expect(eng.getByTestId('state').first()).toHaveAttribute('data-state', 'superseded');
	await expect(eng.getByTestId('superseded-note')).toContainText('Superseded by revision 2');

	// The procedure's page leads with the revision in force and its values.
	await eng.goto(path.replace(/\/revisions\/1$/, ''));
	const inForce = eng.getByTestId('in-force-panel');
	await expect(inForce.getByRole('heading', { name: 'Revision 2, in force' })).toBeVisible();
	await expect(inForce.getByTestId('value-amps')).toContainText('135 A');
	await expect(inForce.getByTestId('print-sheet')).toBeVisible();
	// The "advises and records" line once: the cautions say it, so the footer's copy gives way.
	await expect(eng.getByText(/Beadline advises and records/).filter({ visible: true })).toHaveCount(
		1
	);

	// The trail, folded below, has every step, with the values before and after.
	await eng.getByTestId('trail-fold').locator(':scope > summary').click();
	const trail = eng.getByTestId('trail-entry');
	const actions = await trail.evaluateAll((els) => els.map((e) => e.getAttribute('data-action')));
	expect(actions).toEqual([
		'settings_record.frozen',
		'settings_record.frozen',
		'procedure.created',
		'procedure_revision.created',
		'procedure_revision.updated',
		'procedure_revision.submitted',
		'procedure_revision.returned',
		'procedure_revision.updated',
		'procedure_revision.submitted',
		'procedure_revision.approved',
		'procedure_revision.created',
		'procedure_revision.updated',
		'procedure_revision.submitted',
		'procedure_revision.superseded',
		'procedure_revision.approved'
	]);
	const approval = trail.filter({ hasText: 'procedure_revision.approved' }).first();
	const state = approval.locator('[data-testid=change][data-path=state]');
	await expect(state.getByTestId('before')).toHaveText('in-review');
	await expect(state.getByTestId('after')).toHaveText('approved');
	// …and says it in the shop's words: a sentence, labels, states by name, units.
	await expect(approval.getByTestId('trail-sentence')).toHaveText(
		'Mirela Sand approved and signed the revision'
	);
	await expect(approval.locator('[data-testid=change-words][data-path=state]')).toHaveText(
		/State:\s+In review\s+→\s+Approved/
	);
	const edit = trail.filter({ hasText: 'procedure_revision.updated' }).nth(1);
	await expect(
		edit.locator('[data-path="variables.technique.travelSpeedMmPerS.min"] [data-testid=after]')
	).not.toHaveText('—');
	await expect(
		edit.locator(
			'[data-testid=change-words][data-path="variables.technique.travelSpeedMmPerS.min"]'
		)
	).toContainText(/Travel speed, low end:.*\d (in|mm)\/min/);
	await expect(edit.getByTestId('trail-sentence')).not.toContainText('variables.');
});
