import { json } from '@sveltejs/kit';
import { api, apiMember } from '$lib/server/api/respond';
import { JOB_VIEW_ROLES, jobList } from '$lib/server/fabrication';

/** The shop's jobs, newest first, each with its progress counts. */
export const GET = api(async (event) => {
	const user = await apiMember(event, ...JOB_VIEW_ROLES);
	return json({ jobs: await jobList(user) });
});
