import { requireRole } from '$lib/server/auth/guards';
import { shopTrailCsv } from '$lib/server/procedures';
import { readTrailFilters } from '$lib/schemas/audit';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	const admin = requireRole(event, 'admin');
	const csv = await shopTrailCsv(admin, readTrailFilters(event.url.searchParams));
	const day = new Date().toISOString().slice(0, 10);
	return new Response(csv, {
		headers: {
			'Content-Type': 'text/csv; charset=utf-8',
			'Content-Disposition': `attachment; filename="audit-trail-${day}.csv"`,
			'X-Content-Type-Options': 'nosniff',
			'Cache-Control': 'private, no-store'
		}
	});
};
