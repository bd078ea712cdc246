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
}
