import type { RequestEvent } from '@sveltejs/kit';
import type { Transaction } from 'sequelize';
import type { Role } from '$lib/roles';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { User } from '../models';
import { actorRef, requireActiveAdmin } from './actor';
import { NotFoundError, RefusedError } from './errors';

export interface Person {
	id: string;
	name: string;
	email: string;
	role: Role;
	active: boolean;
	updatedAt: Date;
	createdAt: Date;
}

function person(u: User): Person {
	return {
		id: u.id,
		name: u.name,
		email: u.email,
		role: u.role,
		active: u.active,
		updatedAt: u.updatedAt,
		createdAt: u.createdAt
	};
}

/** Everyone in the actor's shop, by name. */
export async function listPeople(actor: SessionUser): Promise<Person[]> {
	const rows = await User.findAll({ where: { shopId: actor.shopId }, order: [['name', 'ASC']] });
	return rows.map(person);
}

/** One member of the actor's shop; another shop's id is simply not found. */
export async function getPerson(actor: SessionUser, userId: string): Promise<Person> {
	const u = await User.findOne({ where: { id: userId, shopId: actor.shopId } });
	if (!u) throw new NotFoundError('No such person in your shop.');
	return person(u);
}

/**
 * The frame every admin action on a member shares: one transaction, the actor still an active
 * admin, the member found in the actor's own shop (another shop's id is simply not found).
 */
function onMember<R>(
	actor: SessionUser,
	userId: string,
	act: (u: User, me: User, t: Transaction) => Promise<R>
): Promise<R> {
	return write(async (t) => {
		const me = await requireActiveAdmin(actor, t);
		const u = await User.findOne({ where: { id: userId, shopId: actor.shopId }, transaction: t });
		if (!u) throw new NotFoundError('No such person in your shop.');
		return act(u, me, t);
	});
}

type MemberChange = Partial<Pick<User, 'role' | 'active' | 'sessionVersion'>>;

/** Applies a change to a member and records it, before and after, in the same transaction. */
async function changeMember(
	u: User,
	actor: { id: string; name: string },
	action: string,
	before: MemberChange,
	after: MemberChange,
	event: RequestEvent | null,
	t: Transaction
): Promise<void> {
	await User.update(after, { where: { id: u.id, shopId: u.shopId }, transaction: t });
	await audit(
		{ shopId: u.shopId, actor, action, objectType: 'user', objectId: u.id, before, after },
		event,
		t
	);
}

/** The member as stored after a change. */
const reloaded = async (u: User, t: Transaction): Promise<Person> =>
	person(await u.reload({ transaction: t }));

/** A shop always keeps one active admin, or nobody could invite, assign roles or recover. */
async function refuseIfLastAdmin(u: User, t: Transaction): Promise<void> {
	if (u.role !== 'admin' || !u.active) return;
	const admins = await User.count({
		where: { shopId: u.shopId, role: 'admin', active: true },
		transaction: t
	});
	if (admins <= 1)
		throw new RefusedError(
			'This is the shop\u2019s last active admin. Make someone else admin first.'
		);
}

export function changeRole(
	actor: SessionUser,
	userId: string,
	role: Role,
	event: RequestEvent | null = null
): Promise<Person> {
	return onMember(actor, userId, async (u, me, t) => {
		if (u.role === role) return person(u);
		if (u.role === 'admin') await refuseIfLastAdmin(u, t);
		if (u.id === me.id)
			throw new RefusedError('You cannot change your own role. Ask another admin.', 'role');
		await changeMember(u, actorRef(me), 'user.role_changed', { role: u.role }, { role }, event, t);
		return reloaded(u, t);
	});
}

/** Disabling also bumps the session version, so every session of that person ends now. */
export function disableMember(
	actor: SessionUser,
	userId: string,
	event: RequestEvent | null = null
): Promise<Person> {
	return onMember(actor, userId, async (u, me, t) => {
		if (!u.active) return person(u);
		await refuseIfLastAdmin(u, t);
		if (u.id === me.id) throw new RefusedError('You cannot disable yourself. Ask another admin.');
		const before = { active: true, sessionVersion: u.sessionVersion };
		const after = { active: false, sessionVersion: u.sessionVersion + 1 };
		await changeMember(u, actorRef(me), 'user.disabled', before, after, event, t);
		return reloaded(u, t);
	});
}

export function enableMember(
	actor: SessionUser,
	userId: string,
	event: RequestEvent | null = null
): Promise<Person> {
	return onMember(actor, userId, async (u, me, t) => {
		if (u.active) return person(u);
		const [before, after] = [{ active: false }, { active: true }];
		await changeMember(u, actorRef(me), 'user.enabled', before, after, event, t);
		return reloaded(u, t);
	});
}

/** Ends every session of a member of the shop (their next request finds a newer version). */
export function signOutEverywhere(
	actor: SessionUser,
	userId: string,
	event: RequestEvent | null = null
): Promise<void> {
	return onMember(actor, userId, (u, me, t) => bumpSessionVersion(u, actorRef(me), event, t));
}

/** Shared with the profile page's own "sign out everywhere". */
export async function bumpSessionVersion(
	u: User,
	actor: { id: string; name: string },
	event: RequestEvent | null,
	t: Transaction
): Promise<void> {
	const [before, after] = [
		{ sessionVersion: u.sessionVersion },
		{ sessionVersion: u.sessionVersion + 1 }
	];
	await changeMember(u, actor, 'user.signed_out_everywhere', before, after, event, t);
}

export interface PeopleCounts {
	byRole: Record<Role, number>;
	disabled: number;
}

/** Active members per role, and how many are disabled, for the admin overview. */
export async function countPeople(actor: SessionUser): Promise<PeopleCounts> {
	const rows = await User.findAll({
		where: { shopId: actor.shopId },
		attributes: ['role', 'active']
	});
	const byRole: Record<Role, number> = { admin: 0, engineer: 0, inspector: 0, welder: 0 };
	let disabled = 0;
	for (const r of rows) {
		if (!r.active) disabled++;
		else if (r.role in byRole) byRole[r.role]++;
	}
	return { byRole, disabled };
}
