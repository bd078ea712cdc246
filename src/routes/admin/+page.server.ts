import { requireRole } from '$lib/server/auth/guards';
import { config } from '$lib/server/config';
import { countPendingInvites } from '$lib/server/people/invites';
import { countPeople } from '$lib/server/people/members';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const admin = requireRole(event, 'admin');
	const [people, pendingInvites] = await Promise.all([
		countPeople(admin),
		countPendingInvites(admin)
	]);
	return { people, pendingInvites, mailCatcher: !!config.mailCatcherDir };
};
