import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { welderPositionsCodeAnswer, welderPositionsCodeBodySchema } from '$lib/schemas/checks-code';
import type { RequestHandler } from './$types';

// Without `code` (or with asme-ix): QW-461.9 as in the v1 contract. With iso-9606-1: ISO 6947
// test positions to the positions qualified (Tables 12 and 13).
export const POST: RequestHandler = api(async (event) => {
	await apiMember(event);
	const result = welderPositionsCodeAnswer(await readBody(event, welderPositionsCodeBodySchema));
	return result.ok ? json(result.answer) : json({ errors: result.errors }, { status: 400 });
});
