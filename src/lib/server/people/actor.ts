import type { Transaction } from 'sequelize';
import type { SessionUser } from '../auth/session-user';
import { User } from '../models';
import { ForbiddenError } from './errors';

/**
 * Re-reads the acting admin inside the write transaction: a role or active flag that changed since
 * the request began must not let a stale session act. Scoped by shop like every other query.
 */
export async function requireActiveAdmin(actor: SessionUser, t: Transaction): Promise<User> {
	const me = await User.findOne({
		where: { id: actor.id, shopId: actor.shopId, active: true, role: 'admin' },
		transaction: t
	});
	if (!me) throw new ForbiddenError('Only an active admin of this shop can do this.');
	return me;
}

/** The acting member themself, inside the transaction; gone or disabled means forbidden. */
export async function requireSelf(actor: SessionUser, t: Transaction): Promise<User> {
	const me = await User.findOne({
		where: { id: actor.id, shopId: actor.shopId, active: true },
		transaction: t
	});
	if (!me) throw new ForbiddenError('Your account is no longer active.');
	return me;
}

export function actorRef(actor: { id: string; name: string }) {
	return { id: actor.id, name: actor.name };
}
