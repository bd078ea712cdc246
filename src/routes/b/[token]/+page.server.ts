import { error, fail } from '@sveltejs/kit';
import { requireMember } from '$lib/server/auth/guards';
import {
	boothLimiter,
	logLookup,
	memberView,
	receiveTap,
	resolveBoothToken,
	tapContinuity
} from '$lib/server/booth';
import { postedForm } from '$lib/server/forms/posted-form';
import { boothTapSchema } from '$lib/schemas/booth-tap';
import { ForbiddenError, RefusedError } from '$lib/server/people/errors';
import { VIEW_ROLES } from '$lib/server/procedures/access';
import type { Actions, PageServerLoad } from './$types';

// No JavaScript on this route: the page and the tap work as plain HTML on a weak connection.
export const csr = false;

const UNKNOWN = 'This booth link is unknown. Check the code on the sheet, or ask the shop for it.';

// Deliberately public: anyone who scans sees the shop, the number, the revision and its state now.
// The values, shade, cautions and the tap need a signed-in member of the revision's shop.
export const load: PageServerLoad = async (event) => {
	event.setHeaders({ 'cache-control': 'no-store' });
	if (await boothLimiter.isLimited(event)) {
		logLookup(event, { shopId: null, linkId: null, outcome: 'limited' });
		error(429, { message: 'Too many lookups from here. Wait a minute and scan again.' });
	}
	const status = await resolveBoothToken(event.params.token);
	if (!status) {
		logLookup(event, { shopId: null, linkId: null, outcome: 'unknown' });
		error(404, { message: UNKNOWN });
	}
	logLookup(event, {
		shopId: status.shopId,
		linkId: status.link.id,
		outcome: status.link.revoked ? 'revoked' : 'ok'
	});
	const user = event.locals.user;
	const member = user && user.shopId === status.shopId ? user : null;
	const showValues = !!member && !status.link.revoked && status.state === 'approved';
	return {
		status: {
			shopName: status.shopName,
			number: status.number,
			rev: status.rev,
			state: status.state,
			supersededByRev: status.supersededByRev,
			withdrawnAt: status.withdrawnAt?.toISOString() ?? null,
			revoked: status.link.revoked,
			current: status.current && { rev: status.current.rev, path: status.current.path }
		},
		checkedAt: new Date().toISOString(),
		// Not even the shell's offline agent (AppShell.svelte): the booth view loads no script.
		offlineAgent: false,
		signedIn: !!user,
		otherShop: !!user && !member,
		// The tap form carries an id of its own: a resent form (or the phone's queue) counts once.
		tapId: showValues ? crypto.randomUUID() : null,
		member: showValues && member ? await memberView(member, status, event) : null,
		links: member
			? {
					revision: VIEW_ROLES.includes(member.role)
						? `/procedures/${status.procedureId}/revisions/${status.rev}`
						: null,
					admin: member.role === 'admin' ? `/procedures/${status.procedureId}/booth-link` : null
				}
			: null
	};
};

export const actions: Actions = {
	used: async (event) => {
		const user = requireMember(event);
		if (await boothLimiter.isLimited(event))
			return fail(429, { problem: 'Too many requests from here. Wait a minute.' });
		const status = await resolveBoothToken(event.params.token);
		if (!status || status.shopId !== user.shopId) error(404, { message: UNKNOWN });
		const tapId = (await postedForm(event.request)).get('tapId');
		const withId = boothTapSchema.shape.id.safeParse(tapId);
		if (withId.success) {
			const r = await receiveTap(
				user,
				event.params.token,
				{ id: withId.data, madeAt: new Date() },
				event
			);
			if (r.outcome === 'refused') return fail(400, { problem: r.message });
			// A repeat of an id that logged is "already logged" on the page: it changed nothing now.
			const created = r.outcome === 'logged' && !r.repeat;
			return { logged: { created, usedOn: r.usedOn, process: r.process } };
		}
		try {
			const r = await tapContinuity(user, status, event);
			return { logged: { created: r.created, usedOn: r.usedOn, process: r.process } };
		} catch (e) {
			if (e instanceof RefusedError) return fail(400, { problem: e.message });
			if (e instanceof ForbiddenError) return fail(403, { problem: e.message });
			throw e;
		}
	}
};
