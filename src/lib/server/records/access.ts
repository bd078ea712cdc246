// Who may do what with settings records. Pages and endpoints guard with these role lists; the
// services check again inside the write, against the member as the database has them now.
import type { Transaction } from 'sequelize';
import type { Role } from '$lib/roles';
import type { SessionUser } from '../auth/session-user';
import type { SettingsRecord } from '../models';
import { User } from '../models';
import { ForbiddenError } from '../people/errors';

/** Everyone but the welder reads records (the welder's tool is the booth sheet). */
export const VIEW_ROLES: Role[] = ['admin', 'engineer', 'inspector'];
/** Engineers and admins record settings. */
export const CREATE_ROLES: Role[] = ['admin', 'engineer'];

/** Frozen once a procedure cites it: the procedure's evidence must not change under it. */
export function isFrozen(record: Pick<SettingsRecord, 'frozenAt' | 'citedByProcedureId'>): boolean {
	return record.frozenAt != null || record.citedByProcedureId != null;
}

/** Author, engineers and admins may edit, freezing aside. */
export function mayEdit(
	user: Pick<SessionUser, 'id' | 'role'>,
	record: Pick<SettingsRecord, 'authorId'>
): boolean {
	if (user.role === 'welder') return false;
	return CREATE_ROLES.includes(user.role) || record.authorId === user.id;
}

/** ... and only until the record is frozen. */
export function canEdit(
	user: Pick<SessionUser, 'id' | 'role'>,
	record: Pick<SettingsRecord, 'authorId' | 'frozenAt' | 'citedByProcedureId'>
): boolean {
	return !isFrozen(record) && mayEdit(user, record);
}

/** The acting member as stored now (role changes and disabling take effect at once). */
export async function currentActor(actor: SessionUser, t: Transaction): Promise<User> {
	const me = await User.findOne({
		where: { id: actor.id, shopId: actor.shopId, active: true },
		transaction: t
	});
	if (!me) throw new ForbiddenError('Your account is no longer active.');
	return me;
}
