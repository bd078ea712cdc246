import { error } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import { config } from '$lib/server/config';
import { readCaughtMail } from '$lib/server/mail/catcher';
import { addressedToAny, shopAddresses } from '$lib/server/people/shop-addresses';
import type { PageServerLoad } from './$types';

// The local catcher holds every shop's mail, invite links included: show only this shop's.
export const load: PageServerLoad = async (event) => {
	const admin = requireRole(event, 'admin');
	if (!config.mailCatcherDir) error(404, { message: 'No mail catcher runs here.' });
	const [mail, ours] = await Promise.all([
		readCaughtMail(config.mailCatcherDir),
		shopAddresses(admin)
	]);
	return { mail: mail.filter((m) => addressedToAny(m.to, ours)) };
};
