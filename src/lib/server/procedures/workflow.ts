// Submitting a draft, withdrawing an approved revision, and starting a new revision. Every state
// change is a conditional update inside one IMMEDIATE transaction with its audit event.
import type { RequestEvent } from '@sveltejs/kit';
import { Op } from 'sequelize';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { Pqr, ProcedureRevision } from '../models';
import { RefusedError } from '../people/errors';
import { actingMember, actorOf, AlreadyDecidedError, AUTHOR_ROLES } from './access';
import { findProcedure, findRevision, readVariables, syncHead } from './find';
import { linksOf, setLinks } from './links';
import { notifyReviewRequested } from './notify';
import { auditRevision } from './revision-audit';

export interface Notified {
	mailed: boolean;
}

export async function submitRevision(
	actor: SessionUser,
	procedureId: number,
	rev: number,
	event: RequestEvent | null = null,
	opts: { notify?: boolean } = {}
): Promise<Notified> {
	const done = await write(async (t) => {
		const me = await actingMember(actor, AUTHOR_ROLES, t);
		const procedure = await findProcedure(actor, procedureId, t);
		const revision = await findRevision(actor, procedureId, rev, t);
		if (revision.state !== 'draft')
			throw new AlreadyDecidedError(`Revision ${rev} is not a draft; it was submitted already.`);
		// A signature on an uncertified PQR would sign something that may still change.
		const { pqrIds } = await linksOf(revision.id, actor.shopId, t);
		const open = pqrIds.length
			? await Pqr.findAll({
					where: { shopId: actor.shopId, id: { [Op.in]: pqrIds }, state: { [Op.ne]: 'certified' } },
					transaction: t
				})
			: [];
		if (open.length)
			throw new RefusedError(
				`Certify ${open.map((p) => p.number).join(', ')} before submitting: a revision is signed with the certified PQRs it cites.`
			);
		const now = new Date();
		const [n] = await ProcedureRevision.update(
			{ state: 'in-review', submittedById: me.id, submittedAt: now },
			{ where: { id: revision.id, shopId: actor.shopId, state: 'draft' }, transaction: t }
		);
		if (n !== 1) throw new AlreadyDecidedError();
		await syncHead(procedureId, t);
		await auditRevision(t, event, revision, 'submitted', actorOf(me), {
			before: { state: 'draft' },
			after: { state: 'in-review', submittedAt: now.toISOString() }
		});
		return { procedure, revision, me };
	});
	if (opts.notify === false) return { mailed: true };
	const mailed = await notifyReviewRequested({
		shopId: actor.shopId,
		procedureId,
		number: done.procedure.number,
		rev,
		title: readVariables(done.revision).variables.title,
		submittedBy: actorOf(done.me)
	});
	return { mailed };
}

export async function withdrawRevision(
	actor: SessionUser,
	procedureId: number,
	rev: number,
	reason: string,
	event: RequestEvent | null = null
): Promise<void> {
	await write(async (t) => {
		const me = await actingMember(actor, AUTHOR_ROLES, t);
		await findProcedure(actor, procedureId, t);
		const revision = await findRevision(actor, procedureId, rev, t);
		if (revision.state !== 'approved')
			throw new RefusedError(
				`Only the approved revision can be withdrawn; revision ${rev} is not.`
			);
		const now = new Date();
		const [n] = await ProcedureRevision.update(
			{ state: 'withdrawn', withdrawnAt: now, withdrawnById: me.id, withdrawReason: reason },
			{ where: { id: revision.id, shopId: actor.shopId, state: 'approved' }, transaction: t }
		);
		if (n !== 1)
			throw new AlreadyDecidedError('The revision changed meanwhile; nothing was withdrawn.');
		await syncHead(procedureId, t);
		await auditRevision(t, event, revision, 'withdrawn', actorOf(me), {
			before: { state: 'approved' },
			after: { state: 'withdrawn', reason, withdrawnAt: now.toISOString() }
		});
	});
}

/** Copies the newest revision into a new draft; refused while a draft or review is open. */
export async function startRevision(
	actor: SessionUser,
	procedureId: number,
	event: RequestEvent | null = null
): Promise<{ rev: number }> {
	return write(async (t) => {
		const me = await actingMember(actor, AUTHOR_ROLES, t);
		const procedure = await findProcedure(actor, procedureId, t);
		const latest = await ProcedureRevision.findOne({
			where: { procedureId, shopId: actor.shopId },
			order: [['rev', 'DESC']],
			transaction: t
		});
		if (!latest) throw new RefusedError('This procedure has no revision to copy.');
		if (latest.state === 'draft' || latest.state === 'in-review')
			throw new RefusedError(
				`Revision ${latest.rev} is still ${latest.state === 'draft' ? 'a draft' : 'in review'}; finish it before starting another.`
			);
		const rev = latest.rev + 1;
		const revision = await ProcedureRevision.create(
			{
				shopId: actor.shopId,
				procedureId,
				rev,
				state: 'draft',
				variables: latest.variables,
				process: latest.process,
				code: latest.code,
				baseMetalFamily: latest.baseMetalFamily,
				authorId: me.id
			},
			{ transaction: t }
		);
		const links = await setLinks(revision, await linksOf(latest.id, actor.shopId, t), t, {
			actor: actorOf(me),
			event,
			number: procedure.number
		});
		await syncHead(procedureId, t);
		await auditRevision(t, event, revision, 'created', actorOf(me), {
			after: {
				rev,
				state: 'draft',
				copiedFrom: latest.rev,
				variables: readVariables(latest).variables,
				...links
			}
		});
		return { rev };
	});
}
