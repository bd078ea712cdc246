import { requireRole } from '$lib/server/auth/guards';
import { getRecord, recordHistory, VIEW_ROLES } from '$lib/server/records';
import { rethrowAsHttp } from '$lib/server/records/form-errors';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const id = Number(event.params.id);
	try {
		const [record, history] = await Promise.all([getRecord(user, id), recordHistory(user, id)]);
		return {
			record,
			history,
			system: user.unitSystem,
			saved: event.url.searchParams.has('saved'),
			canStartProcedure: user.role === 'engineer' || user.role === 'admin'
		};
	} catch (e) {
		rethrowAsHttp(e);
	}
};
