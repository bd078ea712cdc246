// The shop-wide job list: each job with its joint count (and, as the weld log grows, its
// progress), newest first.
import { fn, col } from 'sequelize';
import type { SessionUser } from '../auth/session-user';
import { JobJoint } from '../models';
import { listJobs } from './jobs';

export interface JobRow {
	id: number;
	number: string;
	customer: string;
	part: string;
	code: string;
	dueOn: string | null;
	joints: number;
}

export async function jobList(actor: Pick<SessionUser, 'shopId'>): Promise<JobRow[]> {
	const jobs = await listJobs(actor);
	const counts = (await JobJoint.findAll({
		where: { shopId: actor.shopId },
		attributes: ['jobId', [fn('count', col('id')), 'n']],
		group: ['jobId'],
		raw: true
	})) as unknown as Array<{ jobId: number; n: number | string }>;
	return jobs.map((j) => ({
		id: j.id,
		number: j.number,
		customer: j.customer,
		part: j.part,
		code: j.code,
		dueOn: j.dueOn,
		joints: Number(counts.find((c) => c.jobId === j.id)?.n ?? 0)
	}));
}
