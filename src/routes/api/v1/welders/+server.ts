import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { apiRefusal, welderJson } from '$lib/server/welders/api';
import { MANAGE_ROLES, VIEW_ROLES } from '$lib/server/welders/access';
import { localDay } from '$lib/server/welders/dates';
import { loadWelders } from '$lib/server/welders/read';
import { createWelder } from '$lib/server/welders/welders';
import { welderApiSchema } from '$lib/schemas/welder';

/** Every welder of the caller's shop with each qualification's status today. */
export const GET = api(async (event) => {
	const user = await apiMember(event, ...VIEW_ROLES);
	const today = localDay(new Date(), user.timeZone);
	const welders = await loadWelders(user.shopId, today);
	return json({ asOf: today, welders: welders.map((w) => welderJson(w, today, false)) });
});

export const POST = api(async (event) => {
	const user = await apiMember(event, ...MANAGE_ROLES);
	const body = await readBody(event, welderApiSchema);
	const w = await createWelder(user, body, event).catch(apiRefusal);
	return json({ id: w.id, name: w.name, stamp: w.stamp }, { status: 201 });
});
