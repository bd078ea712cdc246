import { json } from '@sveltejs/kit';
import { jobCounts } from '$lib/jobs/status';
import { api, apiMember } from '$lib/server/api/respond';
import { JOB_VIEW_ROLES, jobView } from '$lib/server/fabrication';
import { apiRefusal } from '$lib/server/welders/api';

/** One job with its joints, each with its weld log, overrides, inspections, repairs and state. */
export const GET = api(async (event) => {
	const user = await apiMember(event, ...JOB_VIEW_ROLES);
	const job = await jobView(user, Number(event.params.id)).catch(apiRefusal);
	return json({ ...job, counts: jobCounts(job.joints.map((j) => j.history)) });
});
