import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

// A throw-away database and a local mail catcher, set up before the data layer is first imported.
const dir = mkdtempSync(join(tmpdir(), 'beadline-invites-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
const mailDir = join(dir, 'mail');
const { readCaughtMail, startMailCatcher } = await import('../mail/catcher');
const catcher = await startMailCatcher({ port: 0, dir: mailDir });
process.env.SMTP_URL = `smtp://127.0.0.1:${(catcher.server.address() as AddressInfo).port}`;
process.env.ORIGIN = 'http://beadline.test';

const { sequelize, write } = await import('../db');
const { Transaction } = await import('sequelize');
const { Invite, User } = await import('../models');
const { verifyPassword } = await import('../auth/password');
const { InviteGoneError, NotFoundError, RefusedError } = await import('./errors');
const {
	acceptInvite,
	claimInvite,
	createInvite,
	findOpenInvite,
	listPendingInvites,
	revokeInvite
} = await import('./invites');
const { hashInviteToken } = await import('./invite-token');
const { newShop, uniqueEmail } = await import('./test-support');

type Shop = Awaited<ReturnType<typeof newShop>>;
let a: Shop;
let b: Shop;

beforeAll(async () => {
	a = await newShop('Shop A');
	b = await newShop('Shop B');
});

afterAll(async () => {
	await new Promise<void>((resolve) => catcher.close(() => resolve()));
});

/** Invites someone and returns the token from the mail that was actually sent. */
async function invite(shop: Shop, role: 'engineer' | 'welder' | 'admin' = 'welder') {
	const email = uniqueEmail('invitee');
	const result = await createInvite(shop.admin, { name: 'Pat Invitee', email, role });
	expect(result.mailed).toBe(true);
	const mail = (await readCaughtMail(mailDir)).find((m) => m.to.includes(email));
	const token = mail?.text.match(/http:\/\/beadline\.test\/invite\/([A-Za-z0-9_-]{43})/)?.[1];
	if (!token) throw new Error('no invite link in the mail');
	return { email, token, inviteId: result.inviteId };
}

describe('createInvite', () => {
	it('stores only the token digest, mails the link and expires in 7 days', async () => {
		const { email, token, inviteId } = await invite(a, 'engineer');
		const row = await Invite.findByPk(inviteId, { rejectOnEmpty: true });
		expect(row.tokenHash).toBe(hashInviteToken(token));
		expect(row.tokenHash).not.toContain(token);
		expect(row.email).toBe(email);
		const days = (row.expiresAt.getTime() - Date.now()) / 86_400_000;
		expect(days).toBeGreaterThan(6.99);
		expect(days).toBeLessThanOrEqual(7);
		const open = await findOpenInvite(token);
		expect(open).toMatchObject({ shopName: 'Shop A', name: 'Pat Invitee', role: 'engineer' });
	});

	it('refuses an e-mail that already has an account, at the e-mail field', async () => {
		const err = await createInvite(a.admin, {
			name: 'Again',
			email: b.admin.email,
			role: 'welder'
		}).catch((e: unknown) => e);
		expect(err).toBeInstanceOf(RefusedError);
		expect((err as InstanceType<typeof RefusedError>).field).toBe('email');
	});

	it('keeps one working link when the same person is invited twice', async () => {
		const email = uniqueEmail('twice');
		await createInvite(a.admin, { name: 'Twice', email, role: 'welder' });
		await createInvite(a.admin, { name: 'Twice', email, role: 'welder' });
		const pending = (await listPendingInvites(a.admin)).filter((i) => i.email === email);
		expect(pending).toHaveLength(1);
	});

	it('refuses a member who is not an admin', async () => {
		const { addMember } = await import('./test-support');
		const engineer = await addMember(a.shopId, 'engineer');
		await expect(
			createInvite(engineer, { name: 'X', email: uniqueEmail('x'), role: 'welder' })
		).rejects.toThrow(/admin/);
	});
});

describe('acceptInvite', () => {
	it('creates the member with the invite\u2019s role and shop, and works only once', async () => {
		const { email, token } = await invite(a, 'engineer');
		const { userId } = await acceptInvite(token, 'a long new password');
		const user = await User.findByPk(userId, { rejectOnEmpty: true });
		expect(user).toMatchObject({ email, role: 'engineer', shopId: a.shopId, active: true });
		expect(await verifyPassword('a long new password', user.passwordHash)).toBe(true);
		await expect(acceptInvite(token, 'another password 2')).rejects.toBeInstanceOf(InviteGoneError);
		await expect(findOpenInvite(token)).rejects.toBeInstanceOf(InviteGoneError);
		expect(await User.count({ where: { email } })).toBe(1);
	});

	it('lets exactly one of two simultaneous accepts through', async () => {
		const { email, token } = await invite(a);
		const results = await Promise.allSettled([
			acceptInvite(token, 'first password 1'),
			acceptInvite(token, 'second password 2')
		]);
		expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(1);
		const rejected = results.filter((r) => r.status === 'rejected');
		expect(rejected).toHaveLength(1);
		expect((rejected[0] as PromiseRejectedResult).reason).toBeInstanceOf(InviteGoneError);
		expect(await User.count({ where: { email } })).toBe(1);
	});

	it('claims an invite once even without the in-process write queue', async () => {
		// Two IMMEDIATE transactions straight on the database, as two app processes would run them.
		const { inviteId } = await invite(a);
		const claim = () =>
			sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, (t) =>
				claimInvite(inviteId, new Date(), t)
			);
		const claims = await Promise.all([claim(), claim(), claim()]);
		expect(claims.filter(Boolean)).toHaveLength(1);
	});

	it('refuses an expired invite', async () => {
		const { email, token, inviteId } = await invite(a);
		await write((t) =>
			Invite.update(
				{ expiresAt: new Date(Date.now() - 1000) },
				{ where: { id: inviteId }, transaction: t }
			)
		);
		await expect(findOpenInvite(token)).rejects.toMatchObject({ reason: 'gone' });
		await expect(acceptInvite(token, 'too late password')).rejects.toBeInstanceOf(InviteGoneError);
		expect(await User.count({ where: { email } })).toBe(0);
	});

	it('refuses an unknown or malformed token without saying more', async () => {
		await expect(findOpenInvite('A'.repeat(43))).rejects.toMatchObject({ reason: 'unknown' });
		await expect(findOpenInvite('../../etc')).rejects.toMatchObject({ reason: 'unknown' });
		await expect(acceptInvite('A'.repeat(43), 'whatever pass')).rejects.toBeInstanceOf(
			InviteGoneError
		);
	});

	it('refuses a revoked invite', async () => {
		const { token, inviteId } = await invite(a);
		await revokeInvite(a.admin, inviteId);
		await expect(acceptInvite(token, 'revoked password')).rejects.toBeInstanceOf(InviteGoneError);
	});
});

describe('scoping', () => {
	it('treats another shop\u2019s invite as not found', async () => {
		const { inviteId, token } = await invite(b);
		await expect(revokeInvite(a.admin, inviteId)).rejects.toBeInstanceOf(NotFoundError);
		expect((await listPendingInvites(a.admin)).map((i) => i.id)).not.toContain(inviteId);
		// Still usable by its own invitee.
		await expect(findOpenInvite(token)).resolves.toMatchObject({ shopName: 'Shop B' });
	});
});
