import { requireRole } from '$lib/server/auth/guards';
import { AUTHOR_ROLES, listProcedures, VIEW_ROLES } from '$lib/server/procedures';
import { readProcedureFilters } from '$lib/schemas/procedure';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const filters = readProcedureFilters(event.url.searchParams);
	return {
		filters,
		list: await listProcedures(user, filters),
		canCreate: AUTHOR_ROLES.includes(user.role),
		canNumber: user.role === 'admin'
	};
};
