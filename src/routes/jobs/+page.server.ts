import { requireRole } from '$lib/server/auth/guards';
import { JOB_AUTHOR_ROLES, JOB_VIEW_ROLES, jobList } from '$lib/server/fabrication';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...JOB_VIEW_ROLES);
	return { jobs: await jobList(user), canCreate: JOB_AUTHOR_ROLES.includes(user.role) };
};
