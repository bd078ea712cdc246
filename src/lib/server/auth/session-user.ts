import type { Role } from '$lib/roles';
import type { UnitSystem } from '../models/shop';

/** What every load and action knows of the signed-in member (never the password hash). */
export interface SessionUser {
	id: string;
	shopId: number;
	shopName: string;
	name: string;
	email: string;
	role: Role;
	unitSystem: UnitSystem;
	/** The shop's IANA time zone (migration 0015): its calendar day and the times it reads. */
	timeZone: string;
}

/** The session view of a member of `shop`, seen in `unitSystem` (seeds and tests build it so). */
export function sessionUserOf(
	u: Pick<SessionUser, 'id' | 'name' | 'email' | 'role'>,
	shop: { id: number; name: string; timeZone: string },
	unitSystem: UnitSystem
): SessionUser {
	return {
		id: u.id,
		shopId: shop.id,
		shopName: shop.name,
		name: u.name,
		email: u.email,
		role: u.role,
		unitSystem,
		timeZone: shop.timeZone
	};
}
