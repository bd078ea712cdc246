import type { SessionUser } from '../auth/session-user';
import { Invite, User } from '../models';

const ADDRESS = /[^\s<>,"]+@[^\s<>,"]+/g;

/** The addresses a shop may read mail for: its members and everyone it has invited. */
export async function shopAddresses(actor: SessionUser): Promise<Set<string>> {
	const [users, invites] = await Promise.all([
		User.findAll({ where: { shopId: actor.shopId }, attributes: ['email'] }),
		Invite.findAll({ where: { shopId: actor.shopId }, attributes: ['email'] })
	]);
	return new Set([...users, ...invites].map((r) => r.email.toLowerCase()));
}

/** True when any recipient in a header like `Name <a@b>, c@d` belongs to the set. */
export function addressedToAny(to: string, addresses: Set<string>): boolean {
	return (to.match(ADDRESS) ?? []).some((a) => addresses.has(a.toLowerCase()));
}
