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

async function target(actor: SessionUser, userId: string, t: Transaction): Promise<User> {
	const u = await User.findOne({ where: { id: userId, shopId: actor.shopId }, transaction: t });
	if (!u) throw new NotFoundError('No such person in your shop.');
	return u;
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

export async function changeRole(
	actor: SessionUser,
	userId: string,
	role: Role,
	event: RequestEvent | null = null
): Promise<Person> {
	return write(async (t) => {
		const me = await requireActiveAdmin(actor, t);
		const u = await target(actor, userId, t);
		if (u.role === role) return person(u);
		if (u.role === 'admin') await refuseIfLastAdmin(u, t);
		if (u.id === me.id)
			throw new RefusedError('You cannot change your own role. Ask another admin.', 'role');
		await changeMember(u, actorRef(me), 'user.role_changed', { role: u.role }, { role }, event, t);
		return person(await u.reload({ transaction: t }));
	});
}

/** Disabling also bumps the session version, so every session of that person ends now. */
export async function disableMember(
	actor: SessionUser,
	userId: string,
	event: RequestEvent | null = null
): Promise<Person> {
	return write(async (t) => {
		const me = await requireActiveAdmin(actor, t);
		const u = await target(actor, userId, t);
		if (!u.active) return person(u);
		await refuseIfLastAdmin(u, t);
		if (u.id === me.id) throw new RefusedError('You cannot disable yourself. Ask another admin.');
		await changeMember(
			u,
			actorRef(me),
			'user.disabled',
			{ active: true, sessionVersion: u.sessionVersion },
			{ active: false, sessionVersion: u.sessionVersion + 1 },
			event,
			t
		);
		return person(await u.reload({ transaction: t }));
	});
}

export async function enableMember(
	actor: SessionUser,
	userId: string,
	event: RequestEvent | null = null
): Promise<Person> {
	return write(async (t) => {
		const me = await requireActiveAdmin(actor, t);
		const u = await target(actor, userId, t);
		if (u.active) return person(u);
		await changeMember(
			u,
			actorRef(me),
			'user.enabled',
			{ active: false },
			{ active: true },
			event,
			t
		);
		return person(await u.reload({ transaction: t }));
	});
}

/** Ends every session of a member of the shop (their next request finds a newer version). */
export async function signOutEverywhere(
	actor: SessionUser,
	userId: string,
	event: RequestEvent | null = null
): Promise<void> {
	await write(async (t) => {
		const me = await requireActiveAdmin(actor, t);
		const u = await target(actor, userId, t);
		await bumpSessionVersion(u, actorRef(me), event, t);
	});
}

/** Shared with the profile page's own "sign out everywhere". */
export async function bumpSessionVersion(
	u: User,
	actor: { id: string; name: string },
	event: RequestEvent | null,
	t: Transaction
): Promise<void> {
	await changeMember(
		u,
		actor,
		'user.signed_out_everywhere',
		{ sessionVersion: u.sessionVersion },
		{ sessionVersion: u.sessionVersion + 1 },
		event,
		t
	);
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
