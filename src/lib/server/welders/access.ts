// Who may do what with welders. Pages and endpoints guard with these lists; services check again
// inside the write against the member as stored now (a role change takes effect at once).
import type { Transaction } from 'sequelize';
import type { Role } from '$lib/roles';
import type { SessionUser } from '../auth/session-user';
import { User } from '../models';
import { ForbiddenError } from '../people/errors';

/** Read the overview, every welder's page and the ranges. */
export const VIEW_ROLES: Role[] = ['admin', 'engineer', 'inspector'];
/** Add and edit welders and qualifications, log uses by hand, print cards, revoke links. */
export const MANAGE_ROLES: Role[] = ['admin', 'engineer'];

export async function actingMember(
	actor: Pick<SessionUser, 'id' | 'shopId'>,
	roles: readonly Role[],
	t: Transaction
): Promise<User> {
	const me = await User.findOne({
		where: { id: actor.id, shopId: actor.shopId, active: true },
		transaction: t
	});
	if (!me || !roles.includes(me.role)) throw new ForbiddenError('Your role does not allow this.');
	return me;
}
