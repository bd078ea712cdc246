import { requireRole } from '$lib/server/auth/guards';
import { shopTrail } from '$lib/server/procedures';
import { readTrailFilters } from '$lib/schemas/audit';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const admin = requireRole(event, 'admin');
	const filters = readTrailFilters(event.url.searchParams);
	return { filters, trail: await shopTrail(admin, filters), search: event.url.search };
};
