import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

// A throw-away database for this file, set before the data layer is first imported.
process.env.DATABASE_FILE = join(mkdtempSync(join(tmpdir(), 'beadline-profile-')), 'test.sqlite');

const { User } = await import('../models');
const { verifyPassword } = await import('../auth/password');
const { RefusedError } = await import('./errors');
const { changePassword, getProfile, signOutMyDevices, updateProfile } = await import('./profile');
const { getShopSettings, shopDefaultCode, updateShopSettings } = await import('./shop-settings');
const { addMember, newShop } = await import('./test-support');
const { shopDay } = await import('../welders/shop-day');
const { localDay } = await import('../welders/dates');
const { memberFor } = await import('../auth/member-cache');
const { machineZone: zoneOfMachine } = await import('$lib/dates/time-zone');
// New shops start in the machine's zone (create-shop.ts).
const machineZone = zoneOfMachine();

type ShopFixture = Awaited<ReturnType<typeof newShop>>;
let a: ShopFixture;

beforeAll(async () => {
	a = await newShop('Profile A');
});

describe('profile', () => {
	it('stores "shop" as no preference of one\u2019s own', async () => {
		const me = await addMember(a.shopId, 'welder');
		await updateProfile(me, { name: 'Tomas Whitlow', unitSystem: 'metric' });
		expect(await getProfile(me)).toMatchObject({ name: 'Tomas Whitlow', unitSystem: 'metric' });
		await updateProfile(me, { name: 'Tomas Whitlow', unitSystem: 'shop' });
		expect((await User.findByPk(me.id))?.unitSystem).toBeNull();
		expect((await getProfile(me)).unitSystem).toBe('shop');
	});

	it('changes the password only with the current one, and ends every session', async () => {
		const me = a.admin;
		const err = await changePassword(me, {
			current: 'wrong password',
			password: 'brand new password'
		}).catch((e: unknown) => e);
		expect(err).toBeInstanceOf(RefusedError);
		expect((err as InstanceType<typeof RefusedError>).field).toBe('current');
		const before = (await User.findByPk(me.id, { rejectOnEmpty: true })).sessionVersion;
		await changePassword(me, { current: 'correct horse battery', password: 'brand new password' });
		const after = await User.findByPk(me.id, { rejectOnEmpty: true });
		expect(await verifyPassword('brand new password', after.passwordHash)).toBe(true);
		expect(after.sessionVersion).toBe(before + 1);
	});

	it('signs one\u2019s own sessions out everywhere', async () => {
		const me = await addMember(a.shopId, 'inspector');
		await signOutMyDevices(me);
		expect((await User.findByPk(me.id))?.sessionVersion).toBe(2);
	});
});

describe('shop settings', () => {
	it('updates name and unit system for the admin\u2019s own shop only', async () => {
		const b = await newShop('Profile B');
		await updateShopSettings(a.admin, { name: 'Profile A renamed', unitSystem: 'metric' });
		expect(await getShopSettings(a.admin)).toEqual({
			name: 'Profile A renamed',
			unitSystem: 'metric',
			defaultCode: 'asme-ix',
			timeZone: machineZone
		});
		expect(await getShopSettings(b.admin)).toEqual({
			name: 'Profile B',
			unitSystem: 'imperial',
			defaultCode: 'asme-ix',
			timeZone: machineZone
		});
		const welder = await addMember(a.shopId, 'welder');
		await expect(
			updateShopSettings(welder, { name: 'Hijack', unitSystem: 'imperial' })
		).rejects.toThrow(/admin/);
	});

	it('keeps the default code unless it is given, and gives it to new work (issue 15)', async () => {
		const c = await newShop('Profile C');
		await updateShopSettings(c.admin, {
			name: 'Profile C',
			unitSystem: 'metric',
			defaultCode: 'iso-15614-1'
		});
		// A caller that leaves the code out (an older client) keeps it.
		await updateShopSettings(c.admin, { name: 'Profile C', unitSystem: 'imperial' });
		expect(await getShopSettings(c.admin)).toMatchObject({ defaultCode: 'iso-15614-1' });
		expect(await shopDefaultCode(c.shopId)).toBe('iso-15614-1');
		expect(await shopDefaultCode(a.shopId)).toBe('asme-ix');
	});

	it('names the shop\u2019s time zone: its day, and its members\u2019 clock (migration 0015)', async () => {
		const d = await newShop('Profile D');
		await updateShopSettings(d.admin, {
			name: 'Profile D',
			unitSystem: 'imperial',
			timeZone: 'America/Chicago'
		});
		// Left out by a caller, the zone stays.
		await updateShopSettings(d.admin, { name: 'Profile D', unitSystem: 'metric' });
		expect(await getShopSettings(d.admin)).toMatchObject({ timeZone: 'America/Chicago' });
		// 02:00 UTC on 4 December is 20:00 on the 3rd in Chicago (IANA tz database, CST = UTC−6).
		expect(await shopDay(d.shopId, new Date('2026-12-04T02:00:00Z'))).toBe('2026-12-03');
		expect(await shopDay(a.shopId, new Date('2026-12-04T02:00:00Z'))).toBe(
			localDay(new Date('2026-12-04T02:00:00Z'), machineZone)
		);
		// The session's member carries it from the next request on (the shop row changed).
		expect((await memberFor(d.admin.id, 1))?.timeZone).toBe('America/Chicago');
	});
});
