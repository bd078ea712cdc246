import { requireRole } from '$lib/server/auth/guards';
import { diffRevisions, VIEW_ROLES } from '$lib/server/procedures';
import { rethrowAsHttp } from '$lib/server/procedures/form-errors';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const asked = Number(event.url.searchParams.get('with'));
	try {
		return await diffRevisions(
			user,
			Number(event.params.id),
			Number(event.params.rev),
			Number.isInteger(asked) && asked > 0 ? asked : null,
			event
		);
	} catch (e) {
		rethrowAsHttp(e);
	}
};
