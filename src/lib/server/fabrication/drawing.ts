// A job's drawing and the joints marked on it, and the download of an inspection's report.
// The drawing may be replaced (a new drawing revision): the old file is no longer named by the
// job, and the audit trail keeps its digest; markers stay where they were until moved.
import type { RequestEvent } from '@sveltejs/kit';
import type { MarkerForm } from '$lib/schemas/job';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { JobJoint, JointInspection } from '../models';
import { ForbiddenError, NotFoundError, RefusedError } from '../people/errors';
import { actingMember, actorOf } from '../procedures/access';
import { discardUploads } from '../storage';
import { JOB_AUTHOR_ROLES, JOB_VIEW_ROLES } from './access';
import { openJobFile, storeJobFile, type PostedFile } from './files';
import { findJob } from './jobs';
import { findJoint } from './weld-log';

export async function attachDrawing(
	actor: SessionUser,
	jobId: number,
	file: PostedFile,
	event: RequestEvent | null = null
): Promise<void> {
	if (!JOB_AUTHOR_ROLES.includes(actor.role))
		throw new ForbiddenError('Engineers and admins attach the drawing.');
	await findJob(actor, jobId);
	const stored = await storeJobFile(file, 'drawing', 'drawing');
	try {
		await write(async (t) => {
			const me = await actingMember(actor, JOB_AUTHOR_ROLES, t);
			const job = await findJob(actor, jobId, t);
			const before = job.drawingKey ? { name: job.drawingName, sha256: job.drawingSha256 } : null;
			await job.update(
				{
					drawingKey: stored.key,
					drawingName: stored.name,
					drawingSha256: stored.sha256,
					drawingWidth: stored.width,
					drawingHeight: stored.height
				},
				{ transaction: t }
			);
			await audit(
				{
					shopId: actor.shopId,
					actor: actorOf(me),
					action: 'job.drawing_attached',
					objectType: 'job',
					objectId: jobId,
					before,
					after: { name: stored.name, sha256: stored.sha256, kind: stored.mime }
				},
				event,
				t
			);
		});
	} catch (e) {
		await discardUploads([stored.key]);
		throw e;
	}
}

/** The drawing's bytes for a member of the shop; a drawing that no longer matches is refused. */
export async function openDrawing(
	actor: SessionUser,
	jobId: number
): Promise<{ bytes: Buffer; key: string; name: string }> {
	if (!JOB_VIEW_ROLES.includes(actor.role)) throw new NotFoundError('No such job in your shop.');
	const job = await findJob(actor, jobId);
	if (!job.drawingKey || !job.drawingSha256)
		throw new NotFoundError('This job has no drawing attached.');
	const { bytes, intact } = await openJobFile(job.drawingKey, job.drawingSha256);
	if (!intact)
		throw new RefusedError('The stored drawing no longer matches its digest; it was not sent.');
	return { bytes, key: job.drawingKey, name: job.drawingName ?? 'drawing' };
}

/** Places (or, with x and y empty, takes off) a joint's marker on the job's drawing. */
export async function placeMarker(
	actor: SessionUser,
	jobId: number,
	input: MarkerForm,
	event: RequestEvent | null = null
): Promise<void> {
	if (!JOB_AUTHOR_ROLES.includes(actor.role))
		throw new ForbiddenError('Engineers and admins mark joints on the drawing.');
	const { joint } = await findJoint(actor.shopId, input.jointId, jobId);
	const job = await findJob(actor, jobId);
	if (!job.drawingKey) throw new RefusedError('Attach a drawing first.', 'jointId');
	await write(async (t) => {
		const me = await actingMember(actor, JOB_AUTHOR_ROLES, t);
		const row = await JobJoint.findOne({
			where: { id: joint.id },
			lock: t.LOCK.UPDATE,
			transaction: t,
			rejectOnEmpty: true
		});
		const before = row.markerX === null ? null : { x: row.markerX, y: row.markerY };
		await row.update({ markerX: input.x, markerY: input.y }, { transaction: t });
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: 'joint.marker_placed',
				objectType: 'job_joint',
				objectId: joint.id,
				before,
				after: input.x === null ? null : { x: input.x, y: input.y }
			},
			event,
			t
		);
	});
}

/** An inspection's report, through the job it belongs to; every download is on the trail. */
export async function openInspectionReport(
	actor: SessionUser,
	jobId: number,
	inspectionId: number,
	event: RequestEvent | null = null
): Promise<{ bytes: Buffer; key: string; name: string }> {
	if (!JOB_VIEW_ROLES.includes(actor.role)) throw new NotFoundError('No such job in your shop.');
	await findJob(actor, jobId);
	const i = await JointInspection.findOne({ where: { id: inspectionId, shopId: actor.shopId } });
	const joint = i && (await JobJoint.findOne({ where: { id: i.jointId, jobId } }));
	if (!i || !joint || !i.reportKey || !i.reportSha256)
		throw new NotFoundError('No such inspection report on this job.');
	const { bytes, intact, found } = await openJobFile(i.reportKey, i.reportSha256);
	await write(async (t) => {
		const me = await actingMember(actor, JOB_VIEW_ROLES, t);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: intact ? 'joint.report_downloaded' : 'joint.report_tamper_detected',
				objectType: 'job_joint',
				objectId: joint.id,
				after: {
					inspectionId,
					name: i.reportName,
					sha256: i.reportSha256,
					...(intact ? {} : { found })
				}
			},
			event,
			t
		);
	});
	if (!intact)
		throw new RefusedError('The stored report no longer matches its digest; it was not sent.');
	return { bytes, key: i.reportKey, name: i.reportName ?? 'report' };
}
