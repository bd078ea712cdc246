// Adding joints to a job: one from the form, or a pasted list in one transaction (every row is
// checked first; one bad row and nothing is added, with each row's problem named).
import type { RequestEvent } from '@sveltejs/kit';
import { fn, col, Op, where, type Transaction } from 'sequelize';
import type { JointForm } from '$lib/schemas/job';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { JobJoint, Procedure, ProcedureRevision } from '../models';
import { RefusedError } from '../people/errors';
import { actingMember, actorOf } from '../procedures/access';
import { JOB_AUTHOR_ROLES } from './access';
import { parseJointCsv, type RowProblem } from './joint-csv';
import { findJob } from './jobs';

/** Refused with every row's problem; nothing was added. */
export class JointListError extends RefusedError {
	constructor(readonly problems: RowProblem[]) {
		super(
			`${problems.length} problem${problems.length === 1 ? '' : 's'} in the list; no joint was added.`,
			'csv'
		);
		this.name = 'JointListError';
	}
}

/** The revision a joint is to be welded to: the one named, else the one in force, else the newest. */
export async function revisionFor(
	shopId: number,
	number: string,
	rev: string,
	t: Transaction
): Promise<{ id: number } | string> {
	const procedure = await Procedure.findOne({
		where: { shopId, [Op.and]: [where(fn('lower', col('number')), number.toLowerCase())] },
		transaction: t
	});
	if (!procedure) return `no procedure ${number} in your shop.`;
	const wanted = rev ? Number(rev) : (procedure.approvedRev ?? procedure.headRev);
	const revision = await ProcedureRevision.findOne({
		where: { shopId, procedureId: procedure.id, rev: wanted },
		transaction: t
	});
	if (!revision) return `${procedure.number} has no revision ${wanted}.`;
	return { id: revision.id };
}

async function addRows(
	actor: SessionUser,
	jobId: number,
	rows: Array<JointForm & { row: number }>,
	event: RequestEvent | null,
	single: boolean,
	earlier: RowProblem[] = []
): Promise<{ ids: number[] }> {
	return write(async (t) => {
		const me = await actingMember(actor, JOB_AUTHOR_ROLES, t);
		const job = await findJob(actor, jobId, t);
		const existing = await JobJoint.findAll({
			where: { jobId: job.id, shopId: actor.shopId },
			attributes: ['mark'],
			transaction: t
		});
		const taken = new Set(existing.map((j) => j.mark.toLowerCase()));
		const problems: RowProblem[] = [...earlier];
		const ready: Array<{ form: JointForm; revisionId: number }> = [];
		for (const r of rows) {
			if (taken.has(r.mark.toLowerCase())) {
				if (single) throw new RefusedError(`${r.mark} is already a joint of this job.`, 'mark');
				problems.push({
					row: r.row,
					mark: r.mark,
					message: `${r.mark} is already a joint of this job.`
				});
				continue;
			}
			const found = await revisionFor(actor.shopId, r.procedure, r.rev, t);
			if (typeof found === 'string') {
				if (single) throw new RefusedError(found[0]!.toUpperCase() + found.slice(1), 'procedure');
				problems.push({ row: r.row, mark: r.mark, message: `procedure: ${found}` });
				continue;
			}
			ready.push({ form: r, revisionId: found.id });
		}
		if (problems.length) throw new JointListError(problems.sort((x, y) => x.row - y.row));
		const ids: number[] = [];
		for (const { form, revisionId } of ready) {
			const joint = await JobJoint.create(
				{
					shopId: actor.shopId,
					jobId: job.id,
					mark: form.mark,
					jointType: form.jointType,
					size: form.size,
					baseMetals: form.baseMetals,
					position: form.position,
					revisionId
				},
				{ transaction: t }
			);
			ids.push(joint.id);
		}
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: single ? 'job.joint_added' : 'job.joints_imported',
				objectType: 'job',
				objectId: job.id,
				after: {
					joints: ready.map((r, i) => ({ id: ids[i], mark: r.form.mark, revisionId: r.revisionId }))
				}
			},
			event,
			t
		);
		return { ids };
	});
}

export async function addJoint(
	actor: SessionUser,
	jobId: number,
	input: JointForm,
	event: RequestEvent | null = null
): Promise<{ id: number }> {
	const { ids } = await addRows(actor, jobId, [{ ...input, row: 1 }], event, true);
	return { id: ids[0]! };
}

/** Adds every joint of the pasted list, or none (JointListError names each row's problem). */
export async function importJoints(
	actor: SessionUser,
	jobId: number,
	csv: string,
	event: RequestEvent | null = null
): Promise<{ ids: number[] }> {
	const parsed = parseJointCsv(csv);
	// The rows that parsed are checked against the job too, so one answer names every problem.
	return addRows(actor, jobId, parsed.rows, event, false, parsed.problems);
}
