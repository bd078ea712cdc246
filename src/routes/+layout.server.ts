import { config } from '$lib/server/config';
import { navFor } from '$lib/nav';
import type { LayoutServerLoad } from './$types';

// Only what the shell needs to draw navigation; pages guard themselves.
export const load: LayoutServerLoad = ({ locals }) => {
	const user = locals.user;
	return {
		user: user && { name: user.name, role: user.role, shopName: user.shopName },
		nav: user ? navFor(user.role, { mailCatcher: !!config.mailCatcherDir }) : []
	};
};
