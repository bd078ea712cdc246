// Opening and finding jobs, inside the actor's shop (another shop's id is "not found").
import type { RequestEvent } from '@sveltejs/kit';
import { fn, col, Op, where, type Transaction } from 'sequelize';
import type { JobForm } from '$lib/schemas/job';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { lockShop } from '../db/locks';
import { Job } from '../models';
import { NotFoundError, RefusedError } from '../people/errors';
import { actingMember, actorOf } from '../procedures/access';
import { JOB_AUTHOR_ROLES } from './access';

export async function createJob(
	actor: SessionUser,
	input: JobForm,
	event: RequestEvent | null = null
): Promise<{ id: number }> {
	return write(async (t) => {
		const me = await actingMember(actor, JOB_AUTHOR_ROLES, t);
		// Numbers are unique per shop whatever their case: one check-and-create at a time.
		await lockShop(actor.shopId, t);
		const clash = await Job.findOne({
			where: {
				shopId: actor.shopId,
				[Op.and]: [where(fn('lower', col('number')), input.number.toLowerCase())]
			},
			transaction: t
		});
		if (clash) throw new RefusedError(`${input.number} is already a job of your shop.`, 'number');
		const job = await Job.create(
			{
				shopId: actor.shopId,
				number: input.number,
				customer: input.customer,
				part: input.part,
				drawing: input.drawing,
				drawingRev: input.drawingRev,
				code: input.code,
				dueOn: input.dueOn || null,
				createdById: me.id
			},
			{ transaction: t }
		);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: 'job.created',
				objectType: 'job',
				objectId: job.id,
				after: { ...input, dueOn: input.dueOn || null }
			},
			event,
			t
		);
		return { id: job.id };
	});
}

/** Locks the job's row inside a write, so changes to one job take turns in any process. */
export async function findJob(
	actor: Pick<SessionUser, 'shopId'>,
	id: number,
	t?: Transaction
): Promise<Job> {
	const job = await Job.findOne({
		where: { id, shopId: actor.shopId },
		transaction: t,
		...(t ? { lock: t.LOCK.UPDATE } : {})
	});
	if (!job) throw new NotFoundError('No such job in your shop.');
	return job;
}

export async function listJobs(actor: Pick<SessionUser, 'shopId'>): Promise<Job[]> {
	return Job.findAll({
		where: { shopId: actor.shopId },
		order: [['id', 'DESC']],
		limit: 500
	});
}
