// The shop-wide job list: each job with its progress (welded, inspected, accepted, rejected,
// repaired, needing attention), newest first.
import { jobCounts, type JobCounts } from '$lib/jobs/status';
import type { SessionUser } from '../auth/session-user';
import { JobJoint } from '../models';
import { historyOf } from './joint-history';
import { listJobs } from './jobs';

export interface JobRow {
	id: number;
	number: string;
	customer: string;
	part: string;
	code: string;
	dueOn: string | null;
	counts: JobCounts;
}

export async function jobList(actor: Pick<SessionUser, 'shopId'>): Promise<JobRow[]> {
	const jobs = await listJobs(actor);
	const joints = await JobJoint.findAll({
		where: { shopId: actor.shopId },
		attributes: ['id', 'jobId']
	});
	const history = await historyOf(
		actor.shopId,
		joints.map((j) => j.id)
	);
	return jobs.map((j) => ({
		id: j.id,
		number: j.number,
		customer: j.customer,
		part: j.part,
		code: j.code,
		dueOn: j.dueOn,
		counts: jobCounts(joints.filter((x) => x.jobId === j.id).map((x) => history.get(x.id)!))
	}));
}
