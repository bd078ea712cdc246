import { requireRole } from '$lib/server/auth/guards';
import {
	findProcedure,
	findRevision,
	readVariables,
	revisionsOf,
	VIEW_ROLES
} from '$lib/server/procedures';
import { rethrowAsHttp } from '$lib/server/procedures/form-errors';
import { diffRows } from '$lib/procedures/display';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const id = Number(event.params.id);
	const rev = Number(event.params.rev);
	try {
		const procedure = await findProcedure(user, id);
		const revisions = await revisionsOf(user, id);
		const asked = Number(event.url.searchParams.get('with'));
		const other =
			revisions.find((r) => r.rev === asked)?.rev ??
			revisions.find((r) => r.rev !== rev)?.rev ??
			rev;
		const [a, b] = await Promise.all([findRevision(user, id, rev), findRevision(user, id, other)]);
		return {
			procedure: { id, number: procedure.number },
			a: { rev: a.rev, state: a.state },
			b: { rev: b.rev, state: b.state },
			revisions: revisions.map((r) => r.rev),
			rows: diffRows(readVariables(a).variables, readVariables(b).variables, user.unitSystem)
		};
	} catch (e) {
		rethrowAsHttp(e);
	}
};
