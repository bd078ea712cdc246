import { requireRole } from '$lib/server/auth/guards';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = (event) => {
	requireRole(event, 'engineer', 'admin');
	return {};
};
