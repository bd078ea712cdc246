import { error } from '@sveltejs/kit';
import { shopDay } from '$lib/server/welders/shop-day';
import { welderView } from '$lib/server/welders/read';
import { resolveToken } from '$lib/server/welders/verification';
import { verifyLimiter } from '$lib/server/welders/verify-limit';
import type { PageServerLoad } from './$types';

// Public by design: whoever holds the card may check it. Anyone sees the name, ID, processes and
// whether each is current; members of the welder's shop also see the ranges and the log.
export const load: PageServerLoad = async (event) => {
	event.setHeaders({ 'cache-control': 'private, no-store' });
	if (await verifyLimiter.isLimited(event))
		error(429, { message: 'Too many checks from here. Wait a minute and scan again.' });
	const link = await resolveToken(event.params.token);
	if (!link)
		error(404, { message: 'This card link is unknown. Ask the shop that issued the card.' });
	if (link.revokedAt)
		error(410, {
			message:
				'This card has been withdrawn by the shop that issued it. Ask them for the current card.'
		});
	const today = await shopDay(link.shopId);
	const w = await welderView(link.shopId, link.welderId, today);
	const member = event.locals.user?.shopId === link.shopId ? event.locals.user : null;
	const qualifications = w.qualifications.map((q) => ({
		id: q.id,
		process: q.process,
		code: q.code,
		testPositions: q.testPositions,
		state: q.status.state,
		lapsesOn: q.status.lapsesOn,
		daysLeft: q.status.daysLeft,
		dueSoon: q.status.dueSoon
	}));
	return {
		today,
		welder: { name: w.name, stamp: w.stamp, active: w.active },
		qualifications,
		// Only for members of the issuing shop.
		detail: member ? { id: w.id, units: member.unitSystem, view: w } : null
	};
};
