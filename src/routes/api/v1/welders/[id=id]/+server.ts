import { json } from '@sveltejs/kit';
import { api, apiMember } from '$lib/server/api/respond';
import { apiRefusal, welderJson } from '$lib/server/welders/api';
import { VIEW_ROLES } from '$lib/server/welders/access';
import { localDay } from '$lib/server/welders/dates';
import { welderView } from '$lib/server/welders/read';

/** One welder with ranges (and their sources) and the continuity log. */
export const GET = api(async (event) => {
	const user = await apiMember(event, ...VIEW_ROLES);
	const today = localDay(new Date(), user.timeZone);
	const w = await welderView(user.shopId, Number(event.params.id), today).catch(apiRefusal);
	return json(welderJson(w, today, true));
});
