// Booth links: one live short link /b/<token> per signed revision. Approving a revision issues
// it inside the approval's own transaction; an admin may withdraw it (every sheet printed with it
// then reads "link withdrawn") and issue a fresh one. Nothing here imports the procedures
// services, so their approval can call in without a cycle.
import type { RequestEvent } from '@sveltejs/kit';
import { randomBytes } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { config } from '../config';
import { write } from '../db';
import { BoothLink, Procedure, ProcedureRevision, User } from '../models';
import { ForbiddenError, NotFoundError, RefusedError } from '../people/errors';

/** 144 random bits, URL-safe: unguessable, and short enough for a small QR code. */
export const newBoothToken = (): string => randomBytes(18).toString('base64url');
export const BOOTH_TOKEN = /^[A-Za-z0-9_-]{24}$/;

export const boothPath = (token: string): string => `/b/${encodeURIComponent(token)}`;
export const boothUrl = (token: string): string =>
	`${new URL(config.origin).origin}${boothPath(token)}`;

/** States whose revision was signed and so may carry a link and a sheet. */
const SIGNED: readonly string[] = ['approved', 'superseded', 'withdrawn'];

interface RevisionRef {
	id: number;
	shopId: number;
	procedureId: number;
}

async function liveLink(shopId: number, revisionId: number, t?: Transaction) {
	return BoothLink.findOne({
		where: { shopId, revisionId, revokedAt: null },
		order: [['id', 'DESC']],
		transaction: t
	});
}

/**
 * The revision's live link, created if it has none. Pass the caller's transaction (the approval
 * calls this inside its own); idempotent, so a retry or a second call changes nothing.
 */
export async function issueBoothLink(
	revision: RevisionRef,
	t: Transaction,
	by: { id: string } | null = null
): Promise<BoothLink> {
	// One live link per revision, even when two processes print its first sheet at once.
	await ProcedureRevision.findByPk(revision.id, {
		attributes: ['id'],
		lock: t.LOCK.UPDATE,
		transaction: t
	});
	const existing = await liveLink(revision.shopId, revision.id, t);
	if (existing) return existing;
	return BoothLink.create(
		{
			shopId: revision.shopId,
			procedureId: revision.procedureId,
			revisionId: revision.id,
			token: newBoothToken(),
			issuedAt: new Date(),
			issuedById: by?.id ?? null
		},
		{ transaction: t }
	);
}

/**
 * The live link of a signed revision, issued now if it has none (revisions approved before booth
 * links existed, or whose link was withdrawn and not reissued). Null for drafts and reviews.
 */
export async function ensureBoothLink(
	shopId: number,
	revisionId: number
): Promise<BoothLink | null> {
	const found = await liveLink(shopId, revisionId);
	if (found) return found;
	return write(async (t) => {
		const r = await ProcedureRevision.findOne({
			where: { id: revisionId, shopId },
			transaction: t
		});
		if (!r || !SIGNED.includes(r.state)) return null;
		return issueBoothLink(r, t);
	});
}

async function adminOf(actor: SessionUser, t: Transaction): Promise<User> {
	const me = await User.findOne({
		where: { id: actor.id, shopId: actor.shopId, active: true, role: 'admin' },
		transaction: t
	});
	if (!me) throw new ForbiddenError('Only an admin of this shop can withdraw or reissue a link.');
	return me;
}

async function signedRevision(
	actor: SessionUser,
	procedureId: number,
	rev: number,
	t: Transaction
) {
	const procedure = await Procedure.findOne({
		where: { id: procedureId, shopId: actor.shopId },
		transaction: t
	});
	if (!procedure) throw new NotFoundError('No such procedure in your shop.');
	const r = await ProcedureRevision.findOne({
		where: { procedureId, rev, shopId: actor.shopId },
		transaction: t
	});
	if (!r) throw new NotFoundError('No such revision of this procedure.');
	if (!SIGNED.includes(r.state))
		throw new RefusedError(`Revision ${rev} was never approved, so it has no booth link.`);
	return { procedure, revision: r };
}

/**
 * Withdraws the revision's live link; with `reissue`, issues a new one in the same step. Sheets
 * printed with the old link then read "link withdrawn"; reprint them to post the new one.
 */
export async function revokeBoothLink(
	actor: SessionUser,
	procedureId: number,
	rev: number,
	opts: { reissue: boolean },
	event: RequestEvent | null = null
): Promise<{ revoked: number; token: string | null }> {
	return write(async (t) => {
		const me = await adminOf(actor, t);
		const { procedure, revision } = await signedRevision(actor, procedureId, rev, t);
		const now = new Date();
		const [revoked] = await BoothLink.update(
			{ revokedAt: now, revokedById: me.id },
			{ where: { shopId: actor.shopId, revisionId: revision.id, revokedAt: null }, transaction: t }
		);
		if (!revoked && !opts.reissue)
			throw new RefusedError('This revision has no live link to withdraw.');
		const fresh = opts.reissue ? await issueBoothLink(revision, t, me) : null;
		await audit(
			{
				shopId: actor.shopId,
				actor: { id: me.id, name: me.name },
				action: opts.reissue ? 'booth_link.reissued' : 'booth_link.revoked',
				objectType: 'procedure_revision',
				objectId: revision.id,
				before: { liveLinks: revoked },
				after: { number: procedure.number, rev, liveLinks: fresh ? 1 : 0 }
			},
			event,
			t
		);
		return { revoked, token: fresh?.token ?? null };
	});
}
