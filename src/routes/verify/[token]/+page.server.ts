import { error } from '@sveltejs/kit';
import { checkDataBook } from '$lib/server/fabrication/data-book/verify';
import { verifyLimiter } from '$lib/server/welders/verify-limit';
import type { PageServerLoad } from './$types';

// Public by design: whoever holds the data book may check it against the shop's records. Shows
// what its cover shows (job, part, drawing, when, by whom) and whether the records still match.
export const load: PageServerLoad = async (event) => {
	event.setHeaders({ 'cache-control': 'private, no-store' });
	if (await verifyLimiter.isLimited(event))
		error(429, { message: 'Too many checks from here. Wait a minute and scan again.' });
	const check = await checkDataBook(event.params.token);
	if (!check)
		error(404, {
			message: 'This data book link is unknown. Ask the shop that compiled the data book.'
		});
	return { check };
};
