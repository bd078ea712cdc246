import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { pqrRangesCodeAnswer, pqrRangesCodeBodySchema } from '$lib/schemas/checks-code';
import type { RequestHandler } from './$types';

// Without `code` (or with asme-ix): QW-451.1 as in the v1 contract. With aws-d1.1 or
// iso-15614-1: that code's own thickness rows.
export const POST: RequestHandler = api(async (event) => {
	await apiMember(event);
	const result = pqrRangesCodeAnswer(await readBody(event, pqrRangesCodeBodySchema));
	return result.ok ? json(result.answer) : json({ errors: result.errors }, { status: 400 });
});
