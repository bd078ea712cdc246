import { machineZone } from '$lib/dates/time-zone';
import type { RequestEvent } from '@sveltejs/kit';
import { UniqueConstraintError } from 'sequelize';
import type { z } from 'zod';
import type { signUpSchema } from '$lib/schemas/account';
import { audit } from '../audit';
import { hashPassword } from '../auth/password';
import { write } from '../db';
import { Shop, User } from '../models';
import { EMAIL_TAKEN, emailTaken } from './email-taken';
import { RefusedError } from './errors';

export type SignUpInput = Pick<
	z.output<typeof signUpSchema>,
	'shopName' | 'name' | 'email' | 'password'
>;

/** A new shop and its first admin, in one transaction. Refuses an e-mail that has an account. */
export async function createShop(
	input: SignUpInput,
	event: RequestEvent | null = null
): Promise<{ shopId: number; userId: string }> {
	// bcrypt takes ~100 ms: hash before taking the write lock, not while holding it.
	const passwordHash = await hashPassword(input.password);
	try {
		return await write(async (t) => {
			if (await emailTaken(input.email, t)) throw new RefusedError(EMAIL_TAKEN, 'email');
			// The machine's zone until the admin names the shop's own on the shop page.
			const timeZone = machineZone();
			const shop = await Shop.create({ name: input.shopName, timeZone }, { transaction: t });
			const user = await User.create(
				{
					shopId: shop.id,
					name: input.name,
					email: input.email,
					emailVerified: null,
					role: 'admin',
					passwordHash
				},
				{ transaction: t }
			);
			const actor = { id: user.id, name: user.name };
			await audit(
				{
					shopId: shop.id,
					actor,
					action: 'shop.created',
					objectType: 'shop',
					objectId: shop.id,
					after: { name: shop.name, unitSystem: shop.unitSystem }
				},
				event,
				t
			);
			await audit(
				{
					shopId: shop.id,
					actor,
					action: 'user.created',
					objectType: 'user',
					objectId: user.id,
					after: { name: user.name, email: user.email, role: user.role, via: 'sign-up' }
				},
				event,
				t
			);
			return { shopId: shop.id, userId: user.id };
		});
	} catch (e) {
		// Another process may have taken the address between the check and the insert.
		if (e instanceof UniqueConstraintError) throw new RefusedError(EMAIL_TAKEN, 'email');
		throw e;
	}
}
