import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { bodyUnitSystem, checksBodyToSettings } from '$lib/schemas/checks';
import { checksCodeBodySchema, codeExtras } from '$lib/schemas/checks-code';
import { runChecks } from '$lib/weld';
import type { RequestHandler } from './$types';

// Computation only: any member (or token) of any role may ask; nothing is stored. `code` is
// optional: without it the answer is exactly the v1 contract; with it the answer adds what the
// governing code says about each variable given.
export const POST: RequestHandler = api(async (event) => {
	await apiMember(event);
	const body = await readBody(event, checksCodeBodySchema);
	const settings = checksBodyToSettings(body);
	const { findings, derived } = runChecks(settings, { system: bodyUnitSystem(body) });
	const extras = codeExtras(body, settings);
	return json(extras ? { findings, derived, ...extras } : { findings, derived });
});
