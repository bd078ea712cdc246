import { error } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import { compareIds, compareRecords, VIEW_ROLES } from '$lib/server/records';
import { rethrowAsHttp } from '$lib/server/records/form-errors';
import { RefusedError } from '$lib/server/people/errors';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	try {
		return await compareRecords(user, compareIds(event.url.searchParams));
	} catch (e) {
		if (e instanceof RefusedError) error(400, { message: e.message });
		rethrowAsHttp(e);
	}
};
