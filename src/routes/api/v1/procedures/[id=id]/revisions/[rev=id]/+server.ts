import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import {
	AUTHOR_ROLES,
	getRevision,
	saveDraft,
	updateDraft,
	VIEW_ROLES
} from '$lib/server/procedures';
import { attempt } from '$lib/server/procedures/api-errors';
import { revisionFormSchema, variablesSchema } from '$lib/schemas/procedure';
import type { RequestHandler } from './$types';

const ids = (p: { id: string; rev: string }) => [Number(p.id), Number(p.rev)] as const;

/** The revision with its findings, sign-offs and the digest check run on every read. */
export const GET: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...VIEW_ROLES);
	const [id, rev] = ids(event.params);
	return json(await attempt(() => getRevision(user, id, rev, event)));
});

// Either the whole SI document ({ variables, pqrIds, recordIds }) or the editor's text fields.
const documentBody = z.object({
	variables: variablesSchema,
	pqrIds: z.array(z.number().int().positive()).max(10).default([]),
	recordIds: z.array(z.number().int().positive()).max(50).default([])
});
const body = z.union([documentBody, revisionFormSchema]);

/** Saves a draft; any other state answers 409 with the reason. */
export const PUT: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...AUTHOR_ROLES);
	const [id, rev] = ids(event.params);
	const input = await readBody(event, body);
	await attempt(() =>
		'variables' in input
			? saveDraft(user, id, rev, input, event)
			: updateDraft(user, id, rev, input, event)
	);
	return json(await attempt(() => getRevision(user, id, rev, event)));
});
