import { requireRole } from '$lib/server/auth/guards';
import { AUTHOR_ROLES, listProcedures, VIEW_ROLES } from '$lib/server/procedures';
import { readProcedureFilters } from '$lib/schemas/procedure';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const filters = readProcedureFilters(event.url.searchParams);
	const list = await listProcedures(user, filters);
	return {
		filters,
		// The rows as the table shows them: the API's `updatedAt` would only ride along in the page.
		list: {
			...list,
			rows: list.rows.map((r) => ({
				id: r.id,
				number: r.number,
				title: r.title,
				code: r.code,
				process: r.process,
				family: r.family,
				state: r.state,
				headRev: r.headRev,
				approvedRev: r.approvedRev
			}))
		},
		canCreate: AUTHOR_ROLES.includes(user.role),
		canNumber: user.role === 'admin'
	};
};
