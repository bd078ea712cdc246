import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { AUTHOR_ROLES, VIEW_ROLES } from '$lib/server/procedures';
import { attempt } from '$lib/server/procedures/api-errors';
import { createPqr, listPqrs } from '$lib/server/pqrs';
import { pqrFilterSchema, pqrFormSchema } from '$lib/schemas/pqr';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...VIEW_ROLES);
	const raw = Object.fromEntries([...event.url.searchParams].filter(([, v]) => v.trim() !== ''));
	return json({ rows: await listPqrs(user, pqrFilterSchema.parse(raw)) });
});

/** The PQR form's fields as JSON (quantities as text with units, e.g. "1/4 in"). */
export const POST: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...AUTHOR_ROLES);
	const input = await readBody(event, pqrFormSchema);
	const { id } = await attempt(() => createPqr(user, input, event));
	return json({ id, href: `/api/v1/pqrs/${id}` }, { status: 201 });
});
