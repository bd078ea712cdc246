// A job as its page and the API show it: the job, its joints with the procedure revision each is
// to be welded to, and whether that revision is the one in force.
import { Op } from 'sequelize';
import type { SessionUser } from '../auth/session-user';
import { JobJoint, Procedure, ProcedureRevision } from '../models';
import type { JointView } from '$lib/jobs/types';
import { historyOf } from './joint-history';
import { findJob } from './jobs';
import { passesOf } from './weld-check';
import { readVariables } from '../procedures/find';

export interface JobView {
	id: number;
	number: string;
	customer: string;
	part: string;
	drawing: string;
	drawingRev: string;
	code: string;
	dueOn: string | null;
	createdAt: string;
	/** The attached drawing; only an image can be marked on (a PDF is downloaded). */
	drawingFile: {
		name: string;
		kind: 'pdf' | 'image';
		width: number | null;
		height: number | null;
	} | null;
	joints: JointView[];
}

export async function jointsOf(shopId: number, jobIds: number[]): Promise<JointView[]> {
	if (!jobIds.length) return [];
	const joints = await JobJoint.findAll({
		where: { shopId, jobId: { [Op.in]: jobIds } },
		order: [['id', 'ASC']]
	});
	const revisionIds = [...new Set(joints.map((j) => j.revisionId))];
	const revisions = revisionIds.length
		? await ProcedureRevision.findAll({ where: { shopId, id: { [Op.in]: revisionIds } } })
		: [];
	const procedureIds = [...new Set(revisions.map((r) => r.procedureId))];
	const history = await historyOf(
		shopId,
		joints.map((j) => j.id)
	);
	const procedures = procedureIds.length
		? await Procedure.findAll({ where: { shopId, id: { [Op.in]: procedureIds } } })
		: [];
	return joints.map((j) => {
		const r = revisions.find((x) => x.id === j.revisionId);
		const p = procedures.find((x) => x.id === r?.procedureId);
		return {
			id: j.id,
			jobId: j.jobId,
			mark: j.mark,
			jointType: j.jointType,
			size: j.size,
			baseMetals: j.baseMetals,
			position: j.position,
			revisionId: j.revisionId,
			procedureId: p?.id ?? 0,
			procedureNumber: p?.number ?? '(unknown)',
			rev: r?.rev ?? 0,
			revisionState: r?.state ?? 'unknown',
			process: r?.process ?? '',
			passes: r ? passesOf(readVariables(r).variables) : ['root', 'fill', 'cap'],
			round: history.get(j.id)?.round ?? 0,
			history: history.get(j.id)!,
			marker: j.markerX === null || j.markerY === null ? null : { x: j.markerX, y: j.markerY }
		};
	});
}

export async function jobView(actor: Pick<SessionUser, 'shopId'>, id: number): Promise<JobView> {
	const job = await findJob(actor, id);
	return {
		id: job.id,
		number: job.number,
		customer: job.customer,
		part: job.part,
		drawing: job.drawing,
		drawingRev: job.drawingRev,
		code: job.code,
		dueOn: job.dueOn,
		createdAt: job.createdAt.toISOString(),
		drawingFile: job.drawingKey
			? {
					name: job.drawingName ?? 'drawing',
					kind: job.drawingKey.endsWith('.pdf') ? 'pdf' : 'image',
					width: job.drawingWidth,
					height: job.drawingHeight
				}
			: null,
		joints: await jointsOf(actor.shopId, [job.id])
	};
}
