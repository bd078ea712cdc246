import { redirect } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import { VIEW_ROLES } from '$lib/server/procedures';
import type { RequestHandler } from './$types';

// The diff form's plain GET target: sends the two revision numbers on to the diff page.
export const GET: RequestHandler = (event) => {
	requireRole(event, ...VIEW_ROLES);
	const n = (k: string) => Math.max(1, Math.floor(Number(event.url.searchParams.get(k)) || 1));
	redirect(303, `/procedures/${event.params.id}/revisions/${n('a')}/diff?with=${n('b')}`);
};
