import { error } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import { fileResponse, JOB_VIEW_ROLES, openDrawing } from '$lib/server/fabrication';
import { RefusedError } from '$lib/server/people/errors';
import { rethrowAsHttp } from '$lib/server/people/form-errors';
import type { RequestHandler } from './$types';

// The job's drawing, to members of the shop only: never cached, never sniffed; a PDF always a
// download, an image (re-encoded when it was attached) shown on the job page.
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, ...JOB_VIEW_ROLES);
	try {
		const { bytes, key, name } = await openDrawing(user, Number(event.params.id));
		return fileResponse(bytes, key, name);
	} catch (e) {
		if (e instanceof RefusedError) error(409, { message: e.message });
		rethrowAsHttp(e);
	}
};
