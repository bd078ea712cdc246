import { requireRole } from '$lib/server/auth/guards';
import { localDay } from '$lib/server/welders/dates';
import { VIEW_ROLES } from '$lib/server/welders/access';
import { overviewCsv, overviewRows } from '$lib/server/welders/overview';
import { overviewFilterSchema } from '$lib/schemas/welder';
import type { RequestHandler } from './$types';

// The overview's rows as filtered on screen, as of today.
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const filter = overviewFilterSchema.parse(Object.fromEntries(event.url.searchParams));
	const today = localDay(new Date(), user.timeZone);
	const body = overviewCsv(await overviewRows(user.shopId, today, filter));
	return new Response(body, {
		headers: {
			'Content-Type': 'text/csv; charset=utf-8',
			'Content-Disposition': `attachment; filename="welder-qualifications-${today}.csv"`,
			'Cache-Control': 'private, no-store'
		}
	});
};
