// Helpers for the people services' tests only. Import it after DATABASE_FILE is set.
import type { SessionUser } from '../auth/session-user';
import { migrate } from '../db';
import { Shop, User } from '../models';
import { createShop } from './create-shop';

let seq = 0;

/** A unique address per call, so test files never collide even if they share a database. */
export function uniqueEmail(label: string): string {
	return `${label}-${process.pid}-${Date.now().toString(36)}-${++seq}@example.test`;
}

export async function asSessionUser(userId: string): Promise<SessionUser> {
	const u = await User.findByPk(userId, { rejectOnEmpty: true });
	const shop = await Shop.findByPk(u.shopId, { rejectOnEmpty: true });
	return {
		id: u.id,
		shopId: shop.id,
		shopName: shop.name,
		name: u.name,
		email: u.email,
		role: u.role,
		unitSystem: u.unitSystem ?? shop.unitSystem,
		timeZone: shop.timeZone
	};
}

/** A fresh shop with its first admin (password "correct horse battery"). */
export async function newShop(name: string): Promise<{ admin: SessionUser; shopId: number }> {
	await migrate();
	const { shopId, userId } = await createShop({
		shopName: name,
		name: `${name} Admin`,
		email: uniqueEmail('admin'),
		password: 'correct horse battery'
	});
	return { admin: await asSessionUser(userId), shopId };
}

/** A member added straight to the table, for tests that are not about invites. */
export async function addMember(
	shopId: number,
	role: SessionUser['role'],
	name = `${role} ${++seq}`
): Promise<SessionUser> {
	const u = await User.create({
		shopId,
		name,
		email: uniqueEmail(role),
		emailVerified: null,
		role,
		passwordHash: null
	});
	return asSessionUser(u.id);
}
