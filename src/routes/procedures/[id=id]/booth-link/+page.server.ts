import { fail } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import { linksOfProcedure, revokeBoothLink } from '$lib/server/booth';
import { RefusedError } from '$lib/server/people/errors';
import { findProcedure } from '$lib/server/procedures/find';
import { rethrowAsHttp } from '$lib/server/people/form-errors';
import type { Actions, PageServerLoad, RequestEvent } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

// The admin's page for a procedure's booth links: which link each signed revision carries, how
// often it was looked up, and withdraw / reissue.
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'admin');
	return linksOfProcedure(user, Number(event.params.id)).catch(rethrowAsHttp);
};

async function change(event: RequestEvent, reissue: boolean) {
	const user = requireRole(event, 'admin');
	// Another shop's procedure is "not found" before anything about the form is said.
	await findProcedure(user, Number(event.params.id)).catch(rethrowAsHttp);
	const rev = Number((await postedForm(event.request).catch(() => new FormData())).get('rev'));
	if (!Number.isInteger(rev) || rev < 1) return fail(400, { problem: 'Pick a revision.' });
	try {
		const r = await revokeBoothLink(user, Number(event.params.id), rev, { reissue }, event);
		return { done: reissue ? 'reissued' : 'revoked', rev, revoked: r.revoked };
	} catch (e) {
		if (e instanceof RefusedError) return fail(400, { problem: e.message });
		rethrowAsHttp(e);
	}
}

export const actions: Actions = {
	revoke: (event) => change(event, false),
	reissue: (event) => change(event, true)
};
