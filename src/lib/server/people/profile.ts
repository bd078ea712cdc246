import type { RequestEvent } from '@sveltejs/kit';
import type { z } from 'zod';
import type { changePasswordSchema, profileSchema } from '$lib/schemas/account';
import { audit } from '../audit';
import { hashPassword, verifyPassword } from '../auth/password';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { User } from '../models';
import type { UnitSystem } from '../models/shop';
import { actorRef, requireSelf } from './actor';
import { RefusedError } from './errors';
import { bumpSessionVersion } from './members';

export type ProfileInput = z.output<typeof profileSchema>;
export type ChangePasswordInput = Pick<
	z.output<typeof changePasswordSchema>,
	'current' | 'password'
>;
export type UnitPreference = ProfileInput['unitSystem'];

/** The form's "shop" means no preference of one's own: follow the shop's setting. */
export function unitPreference(stored: UnitSystem | null): UnitPreference {
	return stored ?? 'shop';
}

export async function getProfile(
	actor: SessionUser
): Promise<{ name: string; email: string; unitSystem: UnitPreference }> {
	const me = await User.findOne({ where: { id: actor.id, shopId: actor.shopId } });
	return {
		name: me?.name ?? actor.name,
		email: me?.email ?? actor.email,
		unitSystem: unitPreference(me?.unitSystem ?? null)
	};
}

export async function updateProfile(
	actor: SessionUser,
	input: ProfileInput,
	event: RequestEvent | null = null
): Promise<void> {
	const unitSystem: UnitSystem | null = input.unitSystem === 'shop' ? null : input.unitSystem;
	await write(async (t) => {
		const me = await requireSelf(actor, t);
		const before = { name: me.name, unitSystem: me.unitSystem ?? null };
		const after = { name: input.name, unitSystem };
		if (before.name === after.name && before.unitSystem === after.unitSystem) return;
		await User.update(after, { where: { id: me.id, shopId: actor.shopId }, transaction: t });
		await audit(
			{
				shopId: actor.shopId,
				actor: { id: me.id, name: input.name },
				action: 'user.profile_updated',
				objectType: 'user',
				objectId: me.id,
				before,
				after
			},
			event,
			t
		);
	});
}

/**
 * Checks the current password, stores the new one and ends every session, this one included:
 * whoever might know the old password is signed out, and the member signs in again.
 */
export async function changePassword(
	actor: SessionUser,
	input: ChangePasswordInput,
	event: RequestEvent | null = null
): Promise<void> {
	const stored = await User.findOne({ where: { id: actor.id, shopId: actor.shopId } });
	if (!(await verifyPassword(input.current, stored?.passwordHash)))
		throw new RefusedError('That is not your current password.', 'current');
	const passwordHash = await hashPassword(input.password);
	await write(async (t) => {
		const me = await requireSelf(actor, t);
		// The hash may have changed between the check above and the lock; compare what was checked.
		if (me.passwordHash !== stored?.passwordHash)
			throw new RefusedError('Your password changed meanwhile. Try again.', 'current');
		await User.update(
			{ passwordHash },
			{ where: { id: me.id, shopId: actor.shopId }, transaction: t }
		);
		// The hashes never go into the trail; that the change happened is what matters.
		await audit(
			{
				shopId: actor.shopId,
				actor: actorRef(me),
				action: 'user.password_changed',
				objectType: 'user',
				objectId: me.id
			},
			event,
			t
		);
		await bumpSessionVersion(me, actorRef(me), event, t);
	});
}

/** "Sign out everywhere" from one's own profile: every session, this one included. */
export async function signOutMyDevices(
	actor: SessionUser,
	event: RequestEvent | null = null
): Promise<void> {
	await write(async (t) => {
		const me = await requireSelf(actor, t);
		await bumpSessionVersion(me, actorRef(me), event, t);
	});
}
