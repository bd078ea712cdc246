import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import {
	AUTHOR_ROLES,
	createProcedure,
	listProcedures,
	nextNumber,
	VIEW_ROLES
} from '$lib/server/procedures';
import { attempt } from '$lib/server/procedures/api-errors';
import { newProcedureSchema, readProcedureFilters } from '$lib/schemas/procedure';
import { z } from 'zod';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...VIEW_ROLES);
	return json(await listProcedures(user, readProcedureFilters(event.url.searchParams)));
});

// The number may be left out: the shop's pattern gives the next one.
const body = z.preprocess(
	(raw) => (raw && typeof raw === 'object' && !Array.isArray(raw) ? { number: '', ...raw } : raw),
	z.object({ ...newProcedureSchema.shape, number: z.string().trim().max(40).default('') })
);

export const POST: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...AUTHOR_ROLES);
	const input = await readBody(event, body);
	const number = input.number || (await nextNumber(user.shopId, 'wps', input.process));
	const checked = newProcedureSchema.safeParse({ ...input, number });
	if (!checked.success) {
		const errors: Record<string, string[]> = {};
		for (const i of checked.error.issues) (errors[i.path.join('.')] ??= []).push(i.message);
		return json({ errors }, { status: 400 });
	}
	const { id, rev } = await attempt(() => createProcedure(user, checked.data, event));
	return json(
		{ id, number, rev, href: `/api/v1/procedures/${id}/revisions/${rev}` },
		{ status: 201 }
	);
});
