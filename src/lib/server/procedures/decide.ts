// The inspector's decision. Approving is an electronic signature: the password is asked again,
// the signer's id, printed name and role at that moment, the meaning, server UTC time, comment
// and the SHA-256 of the revision's canonical content are stored, sealed to the revision. The
// state change is conditional inside one IMMEDIATE transaction, which also supersedes the
// revision approved before, so two inspectors deciding at once give one decision.
import type { RequestEvent } from '@sveltejs/kit';
import { Op, type Transaction } from 'sequelize';
import { ROLE_LABELS } from '$lib/roles';
import { issueBoothLink } from '../booth/links';
import { clearFailures, isLockedOut, recordFailure } from '../auth/failed-sign-ins';
import { verifyPassword } from '../auth/password';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { AuditEvent, ProcedureRevision, SignOff, User } from '../models';
import { ForbiddenError, RefusedError } from '../people/errors';
import { actingMember, actorOf, AlreadyDecidedError, REVIEW_ROLES } from './access';
import { revisionContent, sealOf } from './digest';
import { findProcedure, findRevision, readVariables, syncHead } from './find';
import { notifyDecision } from './notify';
import { auditRevision } from './revision-audit';

export const WRONG_PASSWORD = 'That password is not right. Nothing was signed.';
export const TOO_MANY_PASSWORDS =
	'Too many wrong passwords for this account. Wait 15 minutes and try again; nothing was signed.';
export const OWN_WORK =
	'You wrote or submitted this revision, so someone else must decide on it. Nothing was signed.';

/** True when the member created, edited or submitted the revision. */
async function wroteIt(userId: string, revision: ProcedureRevision, t: Transaction) {
	if (revision.authorId === userId || revision.submittedById === userId) return true;
	const n = await AuditEvent.count({
		where: {
			shopId: revision.shopId,
			objectType: 'procedure_revision',
			objectId: String(revision.id),
			actorId: userId,
			action: {
				[Op.in]: [
					'procedure_revision.created',
					'procedure_revision.updated',
					'procedure_revision.submitted'
				]
			}
		},
		transaction: t
	});
	return n > 0;
}

interface Decision {
	meaning: 'approved' | 'returned';
	comment: string | null;
}

async function decide(
	actor: SessionUser,
	procedureId: number,
	rev: number,
	d: Decision,
	event: RequestEvent | null
) {
	return write(async (t) => {
		const me = await actingMember(actor, REVIEW_ROLES, t);
		const procedure = await findProcedure(actor, procedureId, t);
		const revision = await findRevision(actor, procedureId, rev, t);
		if (revision.state !== 'in-review') throw new AlreadyDecidedError();
		if (await wroteIt(me.id, revision, t)) throw new ForbiddenError(OWN_WORK);
		const now = new Date();
		const next = d.meaning === 'approved' ? 'approved' : 'draft';
		const [n] = await ProcedureRevision.update(
			{
				state: next,
				decidedAt: now,
				...(d.meaning === 'returned' ? { returnComment: d.comment } : {})
			},
			{ where: { id: revision.id, shopId: actor.shopId, state: 'in-review' }, transaction: t }
		);
		if (n !== 1) throw new AlreadyDecidedError();
		const content = await revisionContent(revision.id, t);
		const manifest = {
			revisionId: revision.id,
			userId: me.id,
			printedName: me.name,
			role: ROLE_LABELS[me.role],
			meaning: d.meaning,
			comment: d.comment,
			signedAt: now,
			digest: content.digest
		};
		const signOff = await SignOff.create(
			{ ...manifest, shopId: actor.shopId, canonical: content.json, seal: sealOf(manifest) },
			{ transaction: t }
		);
		const who = actorOf(me);
		if (d.meaning === 'approved') {
			const older = await ProcedureRevision.findAll({
				where: {
					procedureId,
					shopId: actor.shopId,
					state: 'approved',
					id: { [Op.ne]: revision.id }
				},
				transaction: t
			});
			for (const o of older) {
				await o.update(
					{ state: 'superseded', supersededAt: now, supersededByRev: rev },
					{ transaction: t }
				);
				await auditRevision(t, event, o, 'superseded', who, {
					before: { state: 'approved' },
					after: { state: 'superseded', supersededByRev: rev }
				});
			}
			await issueBoothLink(revision, t, me); // issue #6: the sheet's QR link, in this same transaction
		}
		await syncHead(procedureId, t);
		await auditRevision(t, event, revision, d.meaning, who, {
			before: { state: 'in-review' },
			after: {
				state: next,
				signOffId: signOff.id,
				meaning: d.meaning,
				printedName: me.name,
				role: manifest.role,
				signedAt: now.toISOString(),
				comment: d.comment,
				...(d.meaning === 'approved' ? { digest: content.digest } : {})
			}
		});
		return { procedure, revision, me, signOffId: signOff.id, digest: content.digest };
	});
}

async function mailAuthor(
	actor: SessionUser,
	procedureId: number,
	rev: number,
	r: Awaited<ReturnType<typeof decide>>,
	d: Decision
) {
	return notifyDecision({
		shopId: actor.shopId,
		procedureId,
		number: r.procedure.number,
		rev,
		title: readVariables(r.revision).variables.title,
		recipients: [r.revision.authorId, r.revision.submittedById],
		meaning: d.meaning,
		decidedBy: r.me.name,
		comment: d.comment
	});
}

export async function approveRevision(
	actor: SessionUser,
	procedureId: number,
	rev: number,
	input: { password: string; comment: string },
	event: RequestEvent | null = null,
	opts: { notify?: boolean } = {}
): Promise<{ signOffId: number; digest: string; mailed: boolean }> {
	if (!REVIEW_ROLES.includes(actor.role))
		throw new ForbiddenError('Only an inspector can approve a revision.');
	// Wrong passwords here count with those at sign-in: a borrowed session must not become a
	// way to guess the account's password.
	if (await isLockedOut(actor.email)) throw new RefusedError(TOO_MANY_PASSWORDS, 'password');
	// The password is checked before the write lock is taken (bcrypt is slow on purpose).
	const me = await User.findOne({ where: { id: actor.id, shopId: actor.shopId, active: true } });
	if (!(await verifyPassword(input.password, me?.passwordHash))) {
		const locked = await recordFailure(actor.email);
		const revision = await findRevision(actor, procedureId, rev);
		await write((t) =>
			auditRevision(t, event, revision, 'signature_refused', actorOf(actor), {
				after: { reason: 'wrong password' }
			})
		);
		throw new RefusedError(locked ? TOO_MANY_PASSWORDS : WRONG_PASSWORD, 'password');
	}
	await clearFailures(actor.email);
	const d: Decision = { meaning: 'approved', comment: input.comment.trim() || null };
	const r = await decide(actor, procedureId, rev, d, event);
	const mailed = opts.notify === false ? true : await mailAuthor(actor, procedureId, rev, r, d);
	return { signOffId: r.signOffId, digest: r.digest, mailed };
}

export async function returnRevision(
	actor: SessionUser,
	procedureId: number,
	rev: number,
	input: { comment: string },
	event: RequestEvent | null = null,
	opts: { notify?: boolean } = {}
): Promise<{ mailed: boolean }> {
	if (!REVIEW_ROLES.includes(actor.role))
		throw new ForbiddenError('Only an inspector can return a revision.');
	const comment = input.comment.trim();
	if (!comment) throw new RefusedError('A comment is required to return a revision.', 'comment');
	const d: Decision = { meaning: 'returned', comment };
	const r = await decide(actor, procedureId, rev, d, event);
	const mailed = opts.notify === false ? true : await mailAuthor(actor, procedureId, rev, r, d);
	return { mailed };
}
