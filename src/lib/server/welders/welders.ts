// Adding and editing welders. A welder need not sign in; linking an account lets them log their
// own uses and see their own qualifications.
import type { RequestEvent } from '@sveltejs/kit';
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import type { WelderInput } from '$lib/schemas/welder';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { User, Welder } from '../models';
import { NotFoundError, RefusedError } from '../people/errors';
import { actingMember, MANAGE_ROLES } from './access';

export interface WelderSummary {
	id: number;
	name: string;
	stamp: string;
	email: string | null;
	userId: string | null;
	userName: string | null;
	active: boolean;
}

export function summary(w: Welder, userName: string | null = null): WelderSummary {
	return {
		id: w.id,
		name: w.name,
		stamp: w.stamp,
		email: w.email ?? null,
		userId: w.userId ?? null,
		userName,
		active: w.active
	};
}

/** One welder of the actor's shop; another shop's id is simply not found. */
/** Inside a write transaction the welder's row stays locked until it ends (FOR UPDATE on PostgreSQL). */
export async function findWelder(shopId: number, id: number, t?: Transaction): Promise<Welder> {
	const w = await Welder.findOne({
		where: { id, shopId },
		transaction: t,
		...(t ? { lock: t.LOCK.UPDATE } : {})
	});
	if (!w) throw new NotFoundError('No such welder in your shop.');
	return w;
}

/** The welder record linked to a signed-in account, if any. */
export async function welderOfUser(actor: SessionUser): Promise<Welder | null> {
	return Welder.findOne({ where: { userId: actor.id, shopId: actor.shopId } });
}

/** Accounts a welder can be linked to: members with the welder role not linked yet (+ current). */
export async function linkableAccounts(
	shopId: number,
	keep: string | null = null
): Promise<{ id: string; name: string; email: string }[]> {
	const linked = await Welder.findAll({
		where: { shopId, userId: { [Op.ne]: null } },
		attributes: ['userId']
	});
	const taken = new Set(linked.map((w) => w.userId).filter((id) => id && id !== keep));
	const users = await User.findAll({
		where: { shopId, role: 'welder', active: true },
		order: [['name', 'ASC']]
	});
	return users
		.filter((u) => !taken.has(u.id))
		.map((u) => ({ id: u.id, name: u.name, email: u.email }));
}

async function checkLink(
	shopId: number,
	userId: string,
	t: Transaction,
	welderId: number | null = null
): Promise<void> {
	const u = await User.findOne({ where: { id: userId, shopId }, transaction: t });
	if (!u) throw new RefusedError('Pick an account of your shop.', 'userId');
	const linked = await Welder.findOne({ where: { userId }, transaction: t });
	if (linked && linked.id !== welderId)
		throw new RefusedError('That account is already linked to another welder.', 'userId');
}

// The account link is checked before; the unique index left to fail is the stamp.
function refuseDuplicate(e: unknown): never {
	if (e instanceof UniqueConstraintError)
		throw new RefusedError('Another welder of the shop has this ID or stamp.', 'stamp');
	throw e;
}

const values = (input: WelderInput) => ({
	name: input.name,
	stamp: input.stamp,
	email: input.email || null,
	userId: input.userId || null,
	active: input.active
});

export async function createWelder(
	actor: SessionUser,
	input: WelderInput,
	event: RequestEvent | null = null
): Promise<WelderSummary> {
	return write(async (t) => {
		const me = await actingMember(actor, MANAGE_ROLES, t);
		if (input.userId) await checkLink(actor.shopId, input.userId, t);
		const w = await Welder.create(
			{ shopId: actor.shopId, ...values(input) },
			{ transaction: t }
		).catch(refuseDuplicate);
		await audit(
			{
				shopId: actor.shopId,
				actor: me,
				action: 'welder.created',
				objectType: 'welder',
				objectId: w.id,
				after: values(input)
			},
			event,
			t
		);
		return summary(w);
	});
}

export async function updateWelder(
	actor: SessionUser,
	id: number,
	input: WelderInput,
	event: RequestEvent | null = null
): Promise<WelderSummary> {
	return write(async (t) => {
		const me = await actingMember(actor, MANAGE_ROLES, t);
		const w = await findWelder(actor.shopId, id, t);
		if (input.userId) await checkLink(actor.shopId, input.userId, t, w.id);
		const before = summary(w);
		await w.update(values(input), { transaction: t }).catch(refuseDuplicate);
		await audit(
			{
				shopId: actor.shopId,
				actor: me,
				action: 'welder.updated',
				objectType: 'welder',
				objectId: w.id,
				before,
				after: values(input)
			},
			event,
			t
		);
		return summary(w);
	});
}
