import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { apiRefusal } from '$lib/server/welders/api';
import { MANAGE_ROLES } from '$lib/server/welders/access';
import { recordContinuity } from '$lib/server/welders/continuity';
import { continuitySchema } from '$lib/schemas/welder';

/** Logs a use by hand (engineer or admin, with a note). Idempotent per welder, process and day. */
export const POST = api(async (event) => {
	const user = await apiMember(event, ...MANAGE_ROLES);
	const body = await readBody(event, continuitySchema);
	const r = await recordContinuity({
		shopId: user.shopId,
		welderId: Number(event.params.id),
		process: body.process,
		date: body.usedOn,
		source: 'manual',
		note: body.note,
		actor: user,
		event
	}).catch(apiRefusal);
	return json(r, { status: r.created ? 201 : 200 });
});
