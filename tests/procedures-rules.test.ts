import { expect, test } from '@playwright/test';
import bcrypt from 'bcryptjs';
import { randomUUID } from 'node:crypto';
import { engineer, inspector, signIn, welder } from './support/people';
import { draftInReview, sql, sqlGet } from './support/procedures';

// The signature's rules: password, roles, no self-approval, tamper evidence, one decision.
// Each test signs in two or three people, so they get more than the default 30 s.
test.describe.configure({ timeout: 60_000 });

test('a wrong password does not sign, and nobody but an inspector can approve', async ({
	browser
}) => {
	const eng = await (await browser.newContext()).newPage();
	await signIn(eng, engineer);
	const { id } = await draftInReview(eng.request, 'PW');
	const review = `/procedures/${id}/revisions/1/review`;

	const ins = await (await browser.newContext()).newPage();
	await signIn(ins, inspector);
	await ins.goto(review);
	await ins.getByLabel('Your password').fill('not the password');
	await ins.getByTestId('approve').click();
	await expect(ins.getByTestId('password-error')).toContainText('Nothing was signed');
	await expect(ins.getByLabel('Your password')).toHaveValue('');
	await ins.goto(`/procedures/${id}/revisions/1`);
	await expect(ins.getByTestId('state').first()).toHaveAttribute('data-state', 'in-review');
	await expect(ins.getByTestId('sign-off')).toHaveCount(0);

	const body = { password: engineer.password, comment: '' };
	const approve = `/api/v1/procedures/${id}/revisions/1/approve`;
	expect((await eng.request.post(approve, { data: body })).status()).toBe(403);
	const w = await (await browser.newContext()).newPage();
	await signIn(w, welder);
	expect(
		(await w.request.post(approve, { data: { ...body, password: welder.password } })).status()
	).toBe(403);
	expect((await w.goto(review))?.status()).toBe(403);
	const wrong = await ins.request.post(approve, { data: { password: 'nope', comment: '' } });
	expect(wrong.status()).toBe(400);
	expect((await wrong.json()).errors.password[0]).toContain('not right');
});

test('an engineer given inspector rights by mistake cannot approve their own draft', async ({
	browser
}) => {
	const shop = await sqlGet<{ id: number }>(
		"SELECT id FROM shops WHERE name = 'Larkspur Trailer & Rail'"
	);
	const who = { email: `mixup-${Date.now()}@larkspur.example`, password: 'mixed-up-roles-42' };
	const userId = randomUUID();
	const now = new Date().toISOString().replace('T', ' ').replace('Z', ' +00:00');
	await sql(
		`INSERT INTO users (id, shop_id, name, email, email_verified, role, active, session_version, password_hash, created_at, updated_at)
		 VALUES (?, ?, 'Ada Mixup', ?, ?, 'engineer', 1, 1, ?, ?, ?)`,
		[userId, shop!.id, who.email, now, bcrypt.hashSync(who.password, 8), now, now]
	);
	const page = await (await browser.newContext()).newPage();
	await signIn(page, who);
	const { id } = await draftInReview(page.request, 'SELF');
	await sql("UPDATE users SET role = 'inspector' WHERE id = ?", [userId]);

	const res = await page.request.post(`/api/v1/procedures/${id}/revisions/1/approve`, {
		data: { password: who.password, comment: '' }
	});
	expect(res.status()).toBe(403);
	expect((await res.json()).message).toContain('someone else must decide');
	await page.goto(`/procedures/${id}/revisions/1/review`);
	await expect(page.getByText('someone else must decide on it')).toBeVisible();
	await expect(page.getByTestId('approve-form')).toHaveCount(0);
});

test('a signed revision changed behind the app shows the tamper banner', async ({ browser }) => {
	const eng = await (await browser.newContext()).newPage();
	await signIn(eng, engineer);
	const { id } = await draftInReview(eng.request, 'TAMPER');
	const ins = await (await browser.newContext()).newPage();
	await signIn(ins, inspector);
	const signed = await ins.request.post(`/api/v1/procedures/${id}/revisions/1/approve`, {
		data: { password: inspector.password, comment: 'ok' }
	});
	expect(signed.status()).toBe(200);
	await eng.goto(`/procedures/${id}/revisions/1`);
	await expect(eng.getByTestId('tamper-banner')).toHaveCount(0);

	const changed = await sql(
		`UPDATE procedure_revisions SET variables = replace(variables, '"max":135', '"max":185')
		 WHERE procedure_id = ? AND rev = 1`,
		[id]
	);
	expect(changed).toBe(1);
	await eng.goto(`/procedures/${id}/revisions/1`);
	await expect(eng.getByTestId('tamper-banner')).toBeVisible();
	await expect(eng.getByTestId('tamper-banner')).toContainText('changed since it was signed');
	const api = await (await eng.request.get(`/api/v1/procedures/${id}/revisions/1`)).json();
	expect(api.integrity.ok).toBe(false);
	const logged = await sqlGet<{ n: number }>(
		"SELECT count(*) AS n FROM audit_events WHERE action = 'procedure_revision.tamper_detected' AND object_type = 'procedure_revision' AND object_id = (SELECT CAST(id AS TEXT) FROM procedure_revisions WHERE procedure_id = ? AND rev = 1)",
		[id]
	);
	expect(logged?.n).toBeGreaterThan(0);

	// The diff shows the same banner for the signed revision it shows, and records the view too.
	await eng.goto(`/procedures/${id}/revisions/1/diff`);
	await expect(eng.getByTestId('tamper-banner')).toHaveCount(1);
	await expect(eng.getByTestId('tamper-banner')).toHaveAttribute('data-rev', '1');
	await expect(eng.getByTestId('tamper-banner')).toContainText('changed since it was signed');
	const again = await sqlGet<{ n: number }>(
		"SELECT count(*) AS n FROM audit_events WHERE action = 'procedure_revision.tamper_detected' AND object_id = (SELECT CAST(id AS TEXT) FROM procedure_revisions WHERE procedure_id = ? AND rev = 1)",
		[id]
	);
	expect(again!.n).toBeGreaterThan(logged!.n);

	// Downloading its sheet is on the trail, marked as not matching its signature.
	const sheet = await eng.request.get(`/procedures/${id}/sheet`);
	expect(sheet.status()).toBe(200);
	const download = await sqlGet<{ after: string }>(
		"SELECT after FROM audit_events WHERE action = 'procedure_sheet.downloaded' AND object_id = (SELECT CAST(id AS TEXT) FROM procedure_revisions WHERE procedure_id = ? AND rev = 1)",
		[id]
	);
	expect(JSON.parse(download!.after)).toMatchObject({ rev: 1, intact: false });
});

test('two approvals at the same moment: exactly one signs, the other hears it was decided', async ({
	browser
}) => {
	const eng = await (await browser.newContext()).newPage();
	await signIn(eng, engineer);
	const { id } = await draftInReview(eng.request, 'RACE');
	const session = async () => {
		const p = await (await browser.newContext()).newPage();
		await signIn(p, inspector);
		return p;
	};
	const [a, b] = [await session(), await session()];
	const url = `/api/v1/procedures/${id}/revisions/1/approve`;
	const data = { password: inspector.password, comment: '' };
	const answers = await Promise.all([a.request.post(url, { data }), b.request.post(url, { data })]);
	expect(answers.map((r) => r.status()).sort()).toEqual([200, 409]);
	const conflict = answers.find((r) => r.status() === 409);
	expect((await conflict!.json()).message).toContain('already been decided');
	const n = await sqlGet<{ n: number }>(
		"SELECT count(*) AS n FROM sign_offs WHERE meaning = 'approved' AND revision_id = (SELECT id FROM procedure_revisions WHERE procedure_id = ? AND rev = 1)",
		[id]
	);
	expect(n?.n).toBe(1);
});
