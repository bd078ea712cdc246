import { requireRole } from '$lib/server/auth/guards';
import { recordsCsv, VIEW_ROLES } from '$lib/server/records';
import { readFilters } from '$lib/schemas/settings-record';
import type { RequestHandler } from './$types';

// Exactly the rows the list shows for the same URL, every page of them, in the reader's units.
export const GET: RequestHandler = (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const filters = readFilters(event.url.searchParams);
	const day = new Date().toISOString().slice(0, 10);
	return new Response(recordsCsv(user, filters), {
		headers: {
			'Content-Type': 'text/csv; charset=utf-8',
			'Content-Disposition': `attachment; filename="bench-records-${day}.csv"`,
			'Cache-Control': 'private, no-store'
		}
	});
};
