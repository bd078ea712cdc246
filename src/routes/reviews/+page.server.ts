import { requireRole } from '$lib/server/auth/guards';
import { QUEUE_ROLES, reviewQueue } from '$lib/server/procedures';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...QUEUE_ROLES);
	return {
		queue: await reviewQueue(user),
		canDecide: user.role === 'inspector',
		done: event.url.searchParams.get('done')
	};
};
