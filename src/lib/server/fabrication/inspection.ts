// Inspections and repairs. An inspector records each examination of a joint (VT, PT, MT, RT,
// UT: extent, result, note), signed with the e-signature; the latest one of the joint's current
// round decides whether it stands accepted or rejected. A rejected joint gets a repair entry (the
// repair procedure revision and the welder), which opens the next round: its passes are logged
// and inspected again. Nothing here is ever edited; the history shows every step.
import type { RequestEvent } from '@sveltejs/kit';
import type { InspectionForm, RepairForm } from '$lib/schemas/job';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { JobJoint, JointInspection, JointRepair, WeldLog, Welder } from '../models';
import { ForbiddenError, NotFoundError, RefusedError } from '../people/errors';
import { actingMember, actorOf } from '../procedures/access';
import { INSPECT_ROLES, REPAIR_ROLES } from './access';
import { roundOf } from './joint-history';
import { revisionFor } from './joints';
import { currentRound } from './rounds';
import { checkSignature, inspectorsJoint, sign } from './signing';
import { discardUploads } from '../storage';
import { storeJobFile, type PostedFile } from './files';
import { findJoint, type OnJob } from './weld-log';

export async function recordInspection(
	actor: SessionUser,
	input: InspectionForm & OnJob & { report?: PostedFile | null },
	event: RequestEvent | null = null
): Promise<{ id: number; digest: string }> {
	const { joint, job } = await inspectorsJoint(
		actor,
		input,
		'Only an inspector records an inspection.'
	);
	await checkSignature(actor, input.password, joint.id, event);
	// The report is stored before the write and named in what is signed; a refused write drops it.
	const report = input.report ? await storeJobFile(input.report, 'report', 'nde-report') : null;
	return write(async (t) => {
		const me = await actingMember(actor, INSPECT_ROLES, t);
		const round = await currentRound(joint.id, t);
		const welded = await WeldLog.count({ where: { jointId: joint.id, round }, transaction: t });
		if (!welded)
			throw new RefusedError(
				round
					? `Repair ${round} of ${joint.mark} has no pass logged yet; nothing to inspect. Nothing was signed.`
					: `${joint.mark} has no pass logged yet; nothing to inspect. Nothing was signed.`,
				'jointId'
			);
		const content = {
			kind: 'joint-inspection',
			v: 1,
			job: { id: job.id, number: job.number },
			joint: { id: joint.id, mark: joint.mark },
			round,
			method: input.method,
			extent: input.extent,
			result: input.result,
			note: input.note || null,
			report: report && { name: report.name, sha256: report.sha256 }
		};
		const signed = sign(me, content);
		const i = await JointInspection.create(
			{
				shopId: actor.shopId,
				jointId: joint.id,
				method: input.method,
				extent: input.extent,
				result: input.result,
				note: input.note || null,
				reportKey: report?.key ?? null,
				reportName: report?.name ?? null,
				reportSha256: report?.sha256 ?? null,
				...signed
			},
			{ transaction: t }
		);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: 'joint.inspected',
				objectType: 'job_joint',
				objectId: joint.id,
				after: { inspectionId: i.id, ...content, digest: signed.digest }
			},
			event,
			t
		);
		return { id: i.id, digest: signed.digest };
	}).catch(async (e: unknown) => {
		if (report) await discardUploads([report.key]);
		throw e;
	});
}

export async function recordRepair(
	actor: SessionUser,
	input: RepairForm & OnJob,
	event: RequestEvent | null = null
): Promise<{ id: number; round: number }> {
	if (!REPAIR_ROLES.includes(actor.role))
		throw new ForbiddenError('Engineers, admins and inspectors record repairs.');
	const { joint, job } = await findJoint(actor.shopId, input.jointId, input.jobId);
	return write(async (t) => {
		const me = await actingMember(actor, REPAIR_ROLES, t);
		// The joint's row is locked, so two repairs of one rejection cannot both open a round.
		await JobJoint.findOne({ where: { id: joint.id }, lock: t.LOCK.UPDATE, transaction: t });
		const now = await currentRound(joint.id, t);
		const rejection = await JointInspection.findOne({
			where: { jointId: joint.id },
			order: [['id', 'DESC']],
			transaction: t
		});
		if (!rejection || roundOf(rejection.canonical) !== now || rejection.result !== 'reject')
			throw new RefusedError(
				`${joint.mark} is not rejected (its latest inspection accepted it, or it has none); a repair follows a rejection.`,
				'jointId'
			);
		const welder = await Welder.findOne({
			where: { id: input.welderId, shopId: actor.shopId, active: true },
			transaction: t
		});
		if (!welder) throw new NotFoundError('No such active welder in your shop.');
		const found = await revisionFor(actor.shopId, input.procedure, input.rev, t);
		if (typeof found === 'string')
			throw new RefusedError(found[0]!.toUpperCase() + found.slice(1), 'procedure');
		const round = now + 1;
		const r = await JointRepair.create(
			{
				shopId: actor.shopId,
				jointId: joint.id,
				inspectionId: rejection.id,
				round,
				revisionId: found.id,
				welderId: welder.id,
				note: input.note || null,
				recordedById: me.id,
				recordedByName: me.name
			},
			{ transaction: t }
		);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: 'joint.repair_opened',
				objectType: 'job_joint',
				objectId: joint.id,
				after: {
					job: job.number,
					mark: joint.mark,
					round,
					inspectionId: rejection.id,
					revisionId: found.id,
					welderId: welder.id,
					note: input.note || null
				}
			},
			event,
			t
		);
		return { id: r.id, round };
	});
}
