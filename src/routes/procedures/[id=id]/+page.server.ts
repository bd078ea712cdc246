import { fail, redirect } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import { boothPath, ensureBoothLink } from '$lib/server/booth';
import {
	AUTHOR_ROLES,
	findProcedure,
	getRevision,
	procedureTrail,
	revisionsOf,
	startRevision,
	VIEW_ROLES
} from '$lib/server/procedures';
import { refusal, rethrowAsHttp } from '$lib/server/procedures/form-errors';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const id = Number(event.params.id);
	try {
		const procedure = await findProcedure(user, id);
		const [revisions, trail] = await Promise.all([revisionsOf(user, id), procedureTrail(user, id)]);
		const head = revisions[0];
		// The page leads with the revision in force: its values (checked against the signature, as
		// the revision page checks them), its sheet and its booth view.
		const inForce =
			procedure.approvedRev == null
				? null
				: await getRevision(user, id, procedure.approvedRev, event);
		const link = inForce ? await ensureBoothLink(user.shopId, inForce.revision.id) : null;
		return {
			procedure: {
				id,
				number: procedure.number,
				title: procedure.title,
				code: procedure.code,
				process: procedure.process,
				approvedRev: procedure.approvedRev ?? null,
				headRev: procedure.headRev
			},
			inForce: inForce && {
				rev: inForce.revision.rev,
				decidedAt: inForce.revision.decidedAt,
				groups: inForce.groups,
				findings: inForce.findings,
				variables: inForce.variables,
				integrity: inForce.integrity,
				signedBy: inForce.signOffs.filter((s) => s.meaning === 'approved').at(-1) ?? null,
				boothPath: link ? boothPath(link.token) : null
			},
			revisions,
			trail,
			canStart:
				AUTHOR_ROLES.includes(user.role) && !!head && !['draft', 'in-review'].includes(head.state)
		};
	} catch (e) {
		rethrowAsHttp(e);
	}
};

export const actions: Actions = {
	newRevision: async (event) => {
		const user = requireRole(event, ...AUTHOR_ROLES);
		const id = Number(event.params.id);
		let rev: number;
		try {
			({ rev } = await startRevision(user, id, event));
		} catch (e) {
			const r = refusal(e);
			return fail(r.status, { problem: r.message });
		}
		redirect(303, `/procedures/${id}/revisions/${rev}/edit?created=1`);
	}
};
