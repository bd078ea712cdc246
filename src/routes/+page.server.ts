import { redirect } from '@sveltejs/kit';
import { START_PAGE } from '$lib/roles';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = ({ locals }) => {
	redirect(303, locals.user ? START_PAGE[locals.user.role] : '/signin');
};
