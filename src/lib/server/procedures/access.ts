// Who may do what with procedures and PQRs. Pages and endpoints guard with these lists; the
// services check again inside the write, against the member as the database has them now.
import type { Transaction } from 'sequelize';
import type { Role } from '$lib/roles';
import type { SessionUser } from '../auth/session-user';
import { User } from '../models';
import { ForbiddenError } from '../people/errors';

/** Everyone but the welder reads procedures here (the welder's copy is the booth view). */
export const VIEW_ROLES: Role[] = ['admin', 'engineer', 'inspector'];
/** Engineers and admins write drafts, submit, start revisions and withdraw. */
export const AUTHOR_ROLES: Role[] = ['admin', 'engineer'];
/** Only inspectors decide; approving is their signature. */
export const REVIEW_ROLES: Role[] = ['inspector'];
/** The review desk is the inspector's; admins may look at the queue. */
export const QUEUE_ROLES: Role[] = ['inspector', 'admin'];
/** Certifying a PQR is an engineer's statement. */
export const CERTIFY_ROLES: Role[] = ['engineer'];

/** Refused because someone decided first (the API answers 409). */
export class AlreadyDecidedError extends Error {
	constructor(message = 'This revision has already been decided; nothing was changed.') {
		super(message);
		this.name = 'AlreadyDecidedError';
	}
}

/** The acting member as stored now, holding one of `roles`; anything else is forbidden. */
export async function actingMember(
	actor: SessionUser,
	roles: Role[],
	t?: Transaction
): Promise<User> {
	const me = await User.findOne({
		where: { id: actor.id, shopId: actor.shopId, active: true },
		transaction: t
	});
	if (!me) throw new ForbiddenError('Your account is no longer active.');
	if (!roles.includes(me.role)) throw new ForbiddenError('Your role does not allow this.');
	return me;
}

export const actorOf = (u: { id: string; name: string }) => ({ id: u.id, name: u.name });
