import { requireRole } from '$lib/server/auth/guards';
import { AUTHOR_ROLES, VIEW_ROLES } from '$lib/server/procedures';
import { listPqrs } from '$lib/server/pqrs';
import { pqrFilterSchema } from '$lib/schemas/pqr';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const raw = Object.fromEntries([...event.url.searchParams].filter(([, v]) => v.trim() !== ''));
	const filters = pqrFilterSchema.parse(raw);
	return {
		filters,
		rows: await listPqrs(user, filters),
		canCreate: AUTHOR_ROLES.includes(user.role)
	};
};
