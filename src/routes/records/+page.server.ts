import { requireRole } from '$lib/server/auth/guards';
import {
	authorNames,
	CREATE_ROLES,
	fillersInUse,
	listRecords,
	VIEW_ROLES
} from '$lib/server/records';
import { readFilters } from '$lib/schemas/settings-record';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const filters = readFilters(event.url.searchParams);
	const [list, names, fillers] = await Promise.all([
		listRecords(user, filters),
		authorNames(user.shopId),
		fillersInUse(user.shopId)
	]);
	return {
		...list,
		filters,
		authors: [...names].map(([id, name]) => ({ id, name })),
		fillers,
		system: user.unitSystem,
		canCreate: CREATE_ROLES.includes(user.role)
	};
};
