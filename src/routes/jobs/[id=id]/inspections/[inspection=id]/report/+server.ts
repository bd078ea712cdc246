import { error } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import { fileResponse, JOB_VIEW_ROLES, openInspectionReport } from '$lib/server/fabrication';
import { RefusedError } from '$lib/server/people/errors';
import { rethrowAsHttp } from '$lib/server/people/form-errors';
import type { RequestHandler } from './$types';

// An inspection's NDE report, through its job: members of the shop only, audited, never cached.
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, ...JOB_VIEW_ROLES);
	try {
		const { bytes, key, name } = await openInspectionReport(
			user,
			Number(event.params.id),
			Number(event.params.inspection),
			event
		);
		return fileResponse(bytes, key, name);
	} catch (e) {
		if (e instanceof RefusedError) error(409, { message: e.message });
		rethrowAsHttp(e);
	}
};
