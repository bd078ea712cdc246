import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { welderPositionsAnswer, welderPositionsBodySchema } from '$lib/schemas/checks';
import type { RequestHandler } from './$types';

export const POST: RequestHandler = api(async (event) => {
	await apiMember(event);
	const result = welderPositionsAnswer(await readBody(event, welderPositionsBodySchema));
	return result.ok ? json(result.answer) : json({ errors: result.errors }, { status: 400 });
});
