import type { RequestEvent } from '@sveltejs/kit';
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import type { z } from 'zod';
import type { Role } from '$lib/roles';
import type { inviteSchema } from '$lib/schemas/account';
import { audit } from '../audit';
import { hashPassword } from '../auth/password';
import type { SessionUser } from '../auth/session-user';
import { config } from '../config';
import { write } from '../db';
import { sendMail } from '../mail/send';
import { inviteMail } from '../mail/templates';
import { Invite, Shop, User } from '../models';
import { actorRef, requireActiveAdmin } from './actor';
import { EMAIL_TAKEN, emailTaken } from './email-taken';
import { InviteGoneError, NotFoundError, RefusedError } from './errors';
import { hashInviteToken, looksLikeInviteToken, newInviteToken } from './invite-token';

export type InviteInput = z.output<typeof inviteSchema>;

export const INVITE_DAYS = 7;

export interface PendingInvite {
	id: number;
	name: string;
	email: string;
	role: Role;
	expiresAt: Date;
	createdAt: Date;
}

/** Invites of the actor's shop that can still be used, soonest to expire first. */
export async function listPendingInvites(actor: SessionUser): Promise<PendingInvite[]> {
	const rows = await Invite.findAll({
		where: { shopId: actor.shopId, usedAt: null, expiresAt: { [Op.gt]: new Date() } },
		order: [['expiresAt', 'ASC']]
	});
	return rows.map((r) => ({
		id: r.id,
		name: r.name,
		email: r.email,
		role: r.role,
		expiresAt: r.expiresAt,
		createdAt: r.createdAt
	}));
}

/**
 * Stores a new invite (only the token's digest) and mails the link. Earlier pending invites to the
 * same address in this shop are revoked, so "send it again" leaves one working link.
 * `mailed` is false when the mail server refused: the invite exists, the admin should retry.
 */
export async function createInvite(
	actor: SessionUser,
	input: InviteInput,
	event: RequestEvent | null = null
): Promise<{ inviteId: number; expiresAt: Date; mailed: boolean }> {
	const token = newInviteToken();
	const now = new Date();
	const expiresAt = new Date(now.getTime() + INVITE_DAYS * 24 * 3600 * 1000);
	const created = await write(async (t) => {
		const me = await requireActiveAdmin(actor, t);
		if (await emailTaken(input.email, t)) throw new RefusedError(EMAIL_TAKEN, 'email');
		const shop = await Shop.findByPk(actor.shopId, { transaction: t });
		if (!shop) throw new NotFoundError('Shop not found.');
		const [replaced] = await Invite.update(
			{ expiresAt: now },
			{
				where: {
					shopId: actor.shopId,
					email: input.email,
					usedAt: null,
					expiresAt: { [Op.gt]: now }
				},
				transaction: t
			}
		);
		const invite = await Invite.create(
			{
				shopId: actor.shopId,
				email: input.email,
				name: input.name,
				role: input.role,
				tokenHash: hashInviteToken(token),
				expiresAt,
				invitedById: me.id
			},
			{ transaction: t }
		);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorRef(me),
				action: 'invite.created',
				objectType: 'invite',
				objectId: invite.id,
				after: {
					name: invite.name,
					email: invite.email,
					role: invite.role,
					expiresAt: expiresAt.toISOString(),
					replacedPending: replaced
				}
			},
			event,
			t
		);
		return { invite, shopName: shop.name, invitedBy: me.name };
	});
	// Mail goes out after the commit: an SMTP round trip must not hold the one write lock.
	let mailed = true;
	try {
		await sendMail(
			inviteMail({
				to: input.email,
				name: input.name,
				shopName: created.shopName,
				invitedBy: created.invitedBy,
				role: input.role,
				link: `${config.origin}/invite/${token}`,
				expiresAt
			})
		);
	} catch (e) {
		mailed = false;
		console.error('invite mail not sent', { inviteId: created.invite.id }, e);
	}
	return { inviteId: created.invite.id, expiresAt, mailed };
}

/** Ends a pending invite of the actor's shop now; its link stops working at once. */
export async function revokeInvite(
	actor: SessionUser,
	inviteId: number,
	event: RequestEvent | null = null
): Promise<{ email: string }> {
	return write(async (t) => {
		const me = await requireActiveAdmin(actor, t);
		const now = new Date();
		const invite = await Invite.findOne({
			where: { id: inviteId, shopId: actor.shopId, usedAt: null, expiresAt: { [Op.gt]: now } },
			transaction: t
		});
		if (!invite) throw new NotFoundError('That invite is no longer pending.');
		const before = { expiresAt: invite.expiresAt.toISOString() };
		await Invite.update(
			{ expiresAt: now },
			{ where: { id: invite.id, shopId: actor.shopId }, transaction: t }
		);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorRef(me),
				action: 'invite.revoked',
				objectType: 'invite',
				objectId: invite.id,
				before,
				after: { expiresAt: now.toISOString() }
			},
			event,
			t
		);
		return { email: invite.email };
	});
}

export interface OpenInvite {
	shopName: string;
	name: string;
	email: string;
	role: Role;
	expiresAt: Date;
}

/** What the invite page shows. Throws InviteGoneError for an unknown, used or expired link. */
export async function findOpenInvite(token: string): Promise<OpenInvite> {
	if (!looksLikeInviteToken(token)) throw new InviteGoneError('unknown');
	const invite = await Invite.findOne({
		where: { tokenHash: hashInviteToken(token) },
		include: [Shop]
	});
	if (!invite) throw new InviteGoneError('unknown');
	const shop = (invite as Invite & { Shop?: Shop }).Shop;
	if (!shop || invite.usedAt || invite.expiresAt <= new Date()) throw new InviteGoneError('gone');
	return {
		shopName: shop.name,
		name: invite.name,
		email: invite.email,
		role: invite.role,
		expiresAt: invite.expiresAt
	};
}

/**
 * Marks the invite used if, and only if, it is still unused and unexpired: one conditional UPDATE,
 * so of any number of transactions trying at once exactly one changes the row.
 */
export async function claimInvite(inviteId: number, now: Date, t: Transaction): Promise<boolean> {
	const [changed] = await Invite.update(
		{ usedAt: now },
		{ where: { id: inviteId, usedAt: null, expiresAt: { [Op.gt]: now } }, transaction: t }
	);
	return changed === 1;
}

/**
 * Uses the invite and creates its member. The conditional update claims the invite inside the
 * transaction: of any number of simultaneous accepts exactly one sees a changed row, the others
 * get InviteGoneError, even across processes (the write lock is the database's, not ours).
 */
export async function acceptInvite(
	token: string,
	password: string,
	event: RequestEvent | null = null
): Promise<{ userId: string; email: string }> {
	if (!looksLikeInviteToken(token)) throw new InviteGoneError('unknown');
	const tokenHash = hashInviteToken(token);
	const passwordHash = await hashPassword(password);
	try {
		return await write(async (t) => {
			const invite = await Invite.findOne({ where: { tokenHash }, transaction: t });
			if (!invite) throw new InviteGoneError('unknown');
			const now = new Date();
			if (!(await claimInvite(invite.id, now, t))) throw new InviteGoneError('gone');
			// Thrown inside the transaction, so the claim rolls back with it.
			if (await emailTaken(invite.email, t)) throw new RefusedError(EMAIL_TAKEN);
			const user = await User.create(
				{
					shopId: invite.shopId,
					name: invite.name,
					email: invite.email,
					// Following the mailed link proves the mailbox.
					emailVerified: now,
					role: invite.role,
					passwordHash
				},
				{ transaction: t }
			);
			const actor = { id: user.id, name: user.name };
			await audit(
				{
					shopId: invite.shopId,
					actor,
					action: 'invite.accepted',
					objectType: 'invite',
					objectId: invite.id,
					before: { usedAt: null },
					after: { usedAt: now.toISOString(), userId: user.id }
				},
				event,
				t
			);
			await audit(
				{
					shopId: invite.shopId,
					actor,
					action: 'user.created',
					objectType: 'user',
					objectId: user.id,
					after: { name: user.name, email: user.email, role: user.role, via: 'invite' }
				},
				event,
				t
			);
			return { userId: user.id, email: user.email };
		});
	} catch (e) {
		if (e instanceof UniqueConstraintError) throw new RefusedError(EMAIL_TAKEN);
		throw e;
	}
}

export async function countPendingInvites(actor: SessionUser): Promise<number> {
	return Invite.count({
		where: { shopId: actor.shopId, usedAt: null, expiresAt: { [Op.gt]: new Date() } }
	});
}
