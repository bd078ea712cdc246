// "Welded by me today": a welder logs the passes they finished on a joint. The server refuses,
// in plain words, a joint whose revision is not in force and a welder who is not qualified or
// whose qualification lapsed, unless an inspector signed an override for that welder and joint.
// One row a joint, round and pass (a unique constraint): of many parallel logs one wins. Each
// log counts as a use of the process for the welder's continuity, in the same transaction.
import type { RequestEvent } from '@sveltejs/kit';
import type { WeldLogForm } from '$lib/schemas/job';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { insertUnlessDuplicate } from '../db/dialect';
import { Job, JobJoint, JointRepair, WeldLog, WeldOverride, Welder } from '../models';
import type { WeldPass } from '../models/weld-log';
import { ForbiddenError, NotFoundError, RefusedError } from '../people/errors';
import { actingMember, actorOf } from '../procedures/access';
import { logUse } from '../welders/continuity';
import { localDay } from '../welders/dates';
import { WELD_ROLES } from './access';
import { currentRound } from './rounds';
import { checkWeld } from './weld-check';

export const NOT_A_WELDER =
	'Your account is not linked to a welder record, so there is nothing to log. Ask an engineer or admin to link it on the welder’s page.';

export interface LoggedWeld {
	logged: WeldPass[];
	already: WeldPass[];
	overrideId: number | null;
}

/** Where a form or endpoint names the job (its URL), the joint posted must be one of its own. */
export interface OnJob {
	jobId?: number;
}

/**
 * The joint of the actor's shop, with its job (another shop's joint is "not found"). With
 * `jobId`, a joint of another job of the shop is refused at the joint field: a page or endpoint
 * of one job never writes to another job's joint through a hand-edited id.
 */
export async function findJoint(shopId: number, jointId: number, jobId?: number) {
	const joint = await JobJoint.findOne({ where: { id: jointId, shopId } });
	if (!joint) throw new NotFoundError('No such joint in your shop.');
	if (jobId !== undefined && joint.jobId !== jobId)
		throw new RefusedError('That joint is not on this job; pick one of its joints.', 'jointId');
	const job = await Job.findOne({ where: { id: joint.jobId, shopId }, rejectOnEmpty: true });
	return { joint, job };
}

export async function logWeld(
	actor: SessionUser,
	input: WeldLogForm & OnJob,
	event: RequestEvent | null = null,
	now: Date = new Date()
): Promise<LoggedWeld> {
	if (!WELD_ROLES.includes(actor.role))
		throw new ForbiddenError('Only the welder who welded it logs a weld.');
	const { joint, job } = await findJoint(actor.shopId, input.jointId, input.jobId);
	const welder = await Welder.findOne({ where: { shopId: actor.shopId, userId: actor.id } });
	if (!welder) throw new RefusedError(NOT_A_WELDER);
	const today = localDay(now, actor.timeZone);
	// A repair round is welded to the repair's procedure revision.
	const repair = await JointRepair.findOne({
		where: { jointId: joint.id },
		order: [['round', 'DESC']]
	});
	const revisionId = repair?.revisionId ?? joint.revisionId;
	const check = await checkWeld(
		actor.shopId,
		{ ...joint.get({ plain: true }), revisionId },
		welder,
		today
	);
	if (check.kind === 'revision') throw new RefusedError(check.refusal!);
	const passes = [...new Set(input.passes)];
	if (passes.some((p) => !check.passes.includes(p)))
		throw new RefusedError(
			`${check.procedureLabel} is a single-pass procedure: log the one pass only.`,
			'passes'
		);
	return write(async (t) => {
		const me = await actingMember(actor, WELD_ROLES, t);
		let overrideId: number | null = null;
		if (check.refusal) {
			const override = await WeldOverride.findOne({
				where: { shopId: actor.shopId, jointId: joint.id, welderId: welder.id },
				order: [['id', 'DESC']],
				transaction: t
			});
			if (!override) throw new RefusedError(check.refusal);
			overrideId = override.id;
		}
		// The use counts for continuity; a refusal below rolls it back with the rest.
		const { entry, created } = await logUse(t, {
			shopId: actor.shopId,
			welder,
			process: check.process,
			usedOn: today,
			source: 'booth',
			note: `Weld log: job ${job.number}, joint ${joint.mark}`.slice(0, 500),
			recorder: me,
			now
		});
		const round = await currentRound(joint.id, t);
		const logged: WeldPass[] = [];
		const already: WeldPass[] = [];
		for (const pass of passes) {
			const made = await insertUnlessDuplicate(
				WeldLog,
				{
					shopId: actor.shopId,
					jointId: joint.id,
					welderId: welder.id,
					pass,
					weldedOn: today,
					revisionId,
					round,
					overrideId,
					continuityEntryId: entry.id,
					recordedById: me.id,
					recordedByName: me.name,
					createdAt: now
				},
				t
			);
			(made ? logged : already).push(pass);
		}
		if (!logged.length)
			throw new RefusedError(
				`The ${passes.join(', ')} ${passes.length === 1 ? 'pass' : 'passes'} of ${joint.mark} ${passes.length === 1 ? 'is' : 'are'} already logged; nothing changed.`
			);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: 'weld.logged',
				objectType: 'job_joint',
				objectId: joint.id,
				after: {
					job: job.number,
					mark: joint.mark,
					welderId: welder.id,
					passes: logged,
					round,
					weldedOn: today,
					revisionId,
					overrideId,
					continuity: created ? { process: check.process, usedOn: today } : 'already logged today'
				}
			},
			event,
			t
		);
		return { logged, already, overrideId };
	});
}
