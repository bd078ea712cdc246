import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

// A throw-away database for this file, set before the data layer is first imported.
process.env.DATABASE_FILE = join(mkdtempSync(join(tmpdir(), 'beadline-signup-')), 'test.sqlite');

const { Shop, User } = await import('../models');
const { verifyPassword } = await import('../auth/password');
const { RefusedError } = await import('./errors');
const { createShop } = await import('./create-shop');
const { newShop, uniqueEmail } = await import('./test-support');

let a: Awaited<ReturnType<typeof newShop>>;

beforeAll(async () => {
	a = await newShop('Existing shop');
});

describe('createShop', () => {
	it('creates the shop and its first admin with a hashed password', async () => {
		const email = uniqueEmail('founder');
		const { shopId, userId } = await createShop({
			shopName: 'Larkspur Trailer & Rail',
			name: 'Dana Okafor',
			email,
			password: 'a long password'
		});
		const user = await User.findByPk(userId, { rejectOnEmpty: true });
		expect(user).toMatchObject({ shopId, role: 'admin', active: true, email });
		expect(user.passwordHash).not.toContain('a long password');
		expect(await verifyPassword('a long password', user.passwordHash)).toBe(true);
		expect((await Shop.findByPk(shopId))?.name).toBe('Larkspur Trailer & Rail');
	});

	it('refuses an e-mail that has an account and creates nothing', async () => {
		const shops = await Shop.count();
		const err = await createShop({
			shopName: 'Copycat',
			name: 'X',
			email: a.admin.email,
			password: 'a long password'
		}).catch((e: unknown) => e);
		expect(err).toBeInstanceOf(RefusedError);
		expect((err as InstanceType<typeof RefusedError>).field).toBe('email');
		expect(await Shop.count()).toBe(shops);
	});
});
