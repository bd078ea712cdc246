import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { bodyUnitSystem, checksBodySchema, checksBodyToSettings } from '$lib/schemas/checks';
import { runChecks } from '$lib/weld';
import type { RequestHandler } from './$types';

// Computation only: any member (or token) of any role may ask; nothing is stored.
export const POST: RequestHandler = api(async (event) => {
	await apiMember(event);
	const body = await readBody(event, checksBodySchema);
	const { findings, derived } = runChecks(checksBodyToSettings(body), {
		system: bodyUnitSystem(body)
	});
	return json({ findings, derived });
});
