import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

// A throw-away database for this file, set before the data layer is first imported.
process.env.DATABASE_FILE = join(mkdtempSync(join(tmpdir(), 'beadline-members-')), 'test.sqlite');

const { AuditEvent, User } = await import('../models');
const { ForbiddenError, NotFoundError, RefusedError } = await import('./errors');
const {
	changeRole,
	countPeople,
	disableMember,
	enableMember,
	getPerson,
	listPeople,
	signOutEverywhere
} = await import('./members');
const { addMember, asSessionUser, newShop } = await import('./test-support');

type Shop = Awaited<ReturnType<typeof newShop>>;
let a: Shop;
let b: Shop;

beforeAll(async () => {
	a = await newShop('Members A');
	b = await newShop('Members B');
});

const version = async (id: string) =>
	(await User.findByPk(id, { rejectOnEmpty: true })).sessionVersion;

describe('scoping', () => {
	it('treats another shop\u2019s member as not found, for reads and every write', async () => {
		const theirs = await addMember(b.shopId, 'welder');
		await expect(getPerson(a.admin, theirs.id)).rejects.toBeInstanceOf(NotFoundError);
		expect((await listPeople(a.admin)).map((p) => p.id)).not.toContain(theirs.id);
		for (const attempt of [
			() => changeRole(a.admin, theirs.id, 'admin'),
			() => disableMember(a.admin, theirs.id),
			() => enableMember(a.admin, theirs.id),
			() => signOutEverywhere(a.admin, theirs.id)
		]) {
			await expect(attempt()).rejects.toBeInstanceOf(NotFoundError);
		}
		const untouched = await User.findByPk(theirs.id, { rejectOnEmpty: true });
		expect(untouched).toMatchObject({ role: 'welder', active: true, sessionVersion: 1 });
	});

	it('lets only an active admin act', async () => {
		const engineer = await addMember(a.shopId, 'engineer');
		const welder = await addMember(a.shopId, 'welder');
		await expect(disableMember(engineer, welder.id)).rejects.toBeInstanceOf(ForbiddenError);
	});
});

describe('roles and access', () => {
	it('changes a role and writes the before and after to the trail', async () => {
		const w = await addMember(a.shopId, 'welder');
		const changed = await changeRole(a.admin, w.id, 'inspector');
		expect(changed.role).toBe('inspector');
		const ev = await AuditEvent.findOne({
			where: { action: 'user.role_changed', objectId: w.id }
		});
		expect(JSON.parse(ev?.before ?? '{}')).toEqual({ role: 'welder' });
		expect(JSON.parse(ev?.after ?? '{}')).toEqual({ role: 'inspector' });
		expect(ev?.actorId).toBe(a.admin.id);
	});

	it('disabling ends the sessions; enabling lets the person back', async () => {
		const w = await addMember(a.shopId, 'welder');
		const before = await version(w.id);
		expect((await disableMember(a.admin, w.id)).active).toBe(false);
		expect(await version(w.id)).toBe(before + 1);
		expect((await enableMember(a.admin, w.id)).active).toBe(true);
	});

	it('sign out everywhere bumps the session version', async () => {
		const w = await addMember(a.shopId, 'welder');
		await signOutEverywhere(a.admin, w.id);
		expect(await version(w.id)).toBe(2);
	});
});

describe('admin rules', () => {
	it('refuses the last active admin being demoted or disabled', async () => {
		const solo = await newShop('Solo');
		for (const attempt of [
			() => changeRole(solo.admin, solo.admin.id, 'engineer'),
			() => disableMember(solo.admin, solo.admin.id)
		]) {
			await expect(attempt()).rejects.toThrow(/last active admin/);
		}
		expect(await User.findByPk(solo.admin.id, { rejectOnEmpty: true })).toMatchObject({
			role: 'admin',
			active: true
		});
	});

	it('refuses an admin demoting or disabling themself even with another admin', async () => {
		const shop = await newShop('Two admins');
		const second = await addMember(shop.shopId, 'admin');
		await expect(changeRole(shop.admin, shop.admin.id, 'welder')).rejects.toThrow(/your own/);
		await expect(disableMember(shop.admin, shop.admin.id)).rejects.toBeInstanceOf(RefusedError);
		// Another admin may; then the one left is the last and stays.
		await changeRole(second, shop.admin.id, 'engineer');
		const demoted = await asSessionUser(shop.admin.id);
		expect(demoted.role).toBe('engineer');
		await expect(changeRole(demoted, second.id, 'welder')).rejects.toBeInstanceOf(ForbiddenError);
		expect((await countPeople(second)).byRole).toMatchObject({ admin: 1, engineer: 1 });
	});

	it('a disabled admin does not count as the admin that remains', async () => {
		const shop = await newShop('Disabled admin');
		const other = await addMember(shop.shopId, 'admin');
		await disableMember(shop.admin, other.id);
		await expect(changeRole(other, shop.admin.id, 'welder')).rejects.toBeInstanceOf(ForbiddenError);
		await enableMember(shop.admin, other.id);
		await expect(disableMember(other, shop.admin.id)).resolves.toMatchObject({ active: false });
		await expect(disableMember(other, other.id)).rejects.toThrow(/last active admin/);
	});
});
