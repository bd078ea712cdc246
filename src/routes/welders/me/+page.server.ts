import { error, fail } from '@sveltejs/kit';
import { requireMember } from '$lib/server/auth/guards';
import { ForbiddenError, NotFoundError, RefusedError } from '$lib/server/people/errors';
import { recordContinuity } from '$lib/server/welders/continuity';
import { localDay } from '$lib/server/welders/dates';
import { welderView } from '$lib/server/welders/read';
import { welderOfUser } from '$lib/server/welders/welders';
import { tapSchema } from '$lib/schemas/welder';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

// "My qualifications": the signed-in member's own welder record, whatever their role.
export const load: PageServerLoad = async (event) => {
	const user = requireMember(event);
	const w = await welderOfUser(user);
	const today = localDay(new Date(), user.timeZone);
	if (!w) return { welder: null, today, units: user.unitSystem };
	return { welder: await welderView(user.shopId, w.id, today), today, units: user.unitSystem };
};

export const actions: Actions = {
	// One tap: "I welded with this today". Idempotent, so a double tap changes nothing.
	tap: async (event) => {
		const user = requireMember(event);
		const parsed = tapSchema.safeParse(Object.fromEntries(await postedForm(event.request)));
		if (!parsed.success) return fail(400, { tapError: 'Unknown process.' });
		try {
			const r = await recordContinuity({
				shopId: user.shopId,
				userId: user.id,
				process: parsed.data.process,
				source: 'booth',
				actor: user,
				event
			});
			return {
				tapped: r.created
					? `Logged: ${r.process} today (${r.usedOn}).`
					: `${r.process} was already logged today.`
			};
		} catch (e) {
			if (e instanceof NotFoundError) error(404, { message: e.message });
			if (e instanceof ForbiddenError || e instanceof RefusedError)
				return fail(403, { tapError: e.message });
			throw e;
		}
	}
};
