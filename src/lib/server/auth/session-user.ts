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
