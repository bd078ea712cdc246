import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import {
	createRecord,
	CREATE_ROLES,
	getRecord,
	listRecords,
	recordJson,
	VIEW_ROLES
} from '$lib/server/records';
import { readFilters, settingsRecordApiSchema } from '$lib/schemas/settings-record';
import { apiFailureFor } from './api-errors';
import type { RequestHandler } from './$types';

/** The list with the same filters, sort and pages as /records (query string). */
export const GET: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...VIEW_ROLES);
	const list = await listRecords(user, readFilters(event.url.searchParams));
	return json({
		records: list.rows,
		total: list.total,
		page: list.page,
		pages: list.pages,
		...(Object.keys(list.problems).length ? { ignored: list.problems } : {})
	});
});

/** Creates a record; quantities as text ("3/32 in") or { value, unit }. Findings come back. */
export const POST: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...CREATE_ROLES);
	const body = await readBody(event, settingsRecordApiSchema);
	try {
		const { id } = await createRecord(user, body, [], event);
		return json(recordJson(await getRecord(user, id)), {
			status: 201,
			headers: { Location: `/api/v1/settings/${id}` }
		});
	} catch (e) {
		throw apiFailureFor(e);
	}
});
