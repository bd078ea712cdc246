import { fail, redirect } from '@sveltejs/kit';
import { requireRole } from '$lib/server/auth/guards';
import {
	AUTHOR_ROLES,
	getRevision,
	startRevision,
	submitRevision,
	VIEW_ROLES,
	withdrawRevision
} from '$lib/server/procedures';
import { refusal, rethrowAsHttp } from '$lib/server/procedures/form-errors';
import { describeRevision, weldersForProcedure } from '$lib/server/welders/procedure-welders';
import { withdrawSchema } from '$lib/schemas/procedure';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

const ids = (params: { id: string; rev: string }) =>
	[Number(params.id), Number(params.rev)] as const;

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const [id, rev] = ids(event.params);
	try {
		const view = await getRevision(user, id, rev, event);
		return {
			view,
			// Who can weld to this revision today (issue #7's procedure match).
			welders: await weldersForProcedure(user, describeRevision(view.variables)),
			system: user.unitSystem,
			flash: event.url.searchParams.get('done')
		};
	} catch (e) {
		rethrowAsHttp(e);
	}
};

export const actions: Actions = {
	submit: async (event) => {
		const user = requireRole(event, ...AUTHOR_ROLES);
		const [id, rev] = ids(event.params);
		let mailed = true;
		try {
			({ mailed } = await submitRevision(user, id, rev, event));
		} catch (e) {
			const r = refusal(e);
			return fail(r.status, { problem: r.message });
		}
		redirect(303, `?done=${mailed ? 'submitted' : 'submitted-unmailed'}`);
	},
	withdraw: async (event) => {
		const user = requireRole(event, ...AUTHOR_ROLES);
		const [id, rev] = ids(event.params);
		const parsed = withdrawSchema.safeParse(Object.fromEntries(await postedForm(event.request)));
		if (!parsed.success)
			return fail(400, { withdrawError: parsed.error.issues[0]?.message ?? 'Give a reason.' });
		try {
			await withdrawRevision(user, id, rev, parsed.data.reason, event);
		} catch (e) {
			const r = refusal(e);
			return fail(r.status, { problem: r.message });
		}
		redirect(303, '?done=withdrawn');
	},
	newRevision: async (event) => {
		const user = requireRole(event, ...AUTHOR_ROLES);
		const [id] = ids(event.params);
		let next: number;
		try {
			({ rev: next } = await startRevision(user, id, event));
		} catch (e) {
			const r = refusal(e);
			return fail(r.status, { problem: r.message });
		}
		redirect(303, `/procedures/${id}/revisions/${next}/edit?created=1`);
	}
};
