import { requireMember } from '$lib/server/auth/guards';
import type { PageServerLoad } from './$types';

// Every member may stand at a booth: any role reads a posted procedure.
export const load: PageServerLoad = (event) => {
	requireMember(event);
	return {};
};
