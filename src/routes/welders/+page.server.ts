import { requireRole } from '$lib/server/auth/guards';
import { localDay } from '$lib/server/welders/dates';
import { MANAGE_ROLES, VIEW_ROLES } from '$lib/server/welders/access';
import { overviewRows } from '$lib/server/welders/overview';
import { overviewFilterSchema } from '$lib/schemas/welder';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const filter = overviewFilterSchema.parse(Object.fromEntries(event.url.searchParams));
	const today = localDay(new Date(), user.timeZone);
	const rows = await overviewRows(user.shopId, today, filter);
	return { rows, filter, today, canManage: MANAGE_ROLES.includes(user.role) };
};
