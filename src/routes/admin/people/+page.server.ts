import { fail, message, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import { NotFoundError } from '$lib/server/people/errors';
import { refuseForm, rethrowAsHttp } from '$lib/server/people/form-errors';
import { createInvite, listPendingInvites, revokeInvite } from '$lib/server/people/invites';
import { listPeople } from '$lib/server/people/members';
import { inviteSchema, revokeInviteSchema } from '$lib/schemas/account';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

export const load: PageServerLoad = async (event) => {
	const admin = requireRole(event, 'admin');
	const [people, invites, inviteForm] = await Promise.all([
		listPeople(admin),
		listPendingInvites(admin),
		superValidate({ role: 'welder' }, zod4(inviteSchema), { id: 'invite', errors: false })
	]);
	return { people, invites, inviteForm, me: admin.id };
};

export const actions: Actions = {
	invite: async (event) => {
		const admin = requireRole(event, 'admin');
		const form = await superValidate(await postedForm(event.request), zod4(inviteSchema), {
			id: 'invite'
		});
		if (!form.valid) return fail(400, { form });
		try {
			const sent = await createInvite(admin, form.data, event);
			if (!sent.mailed) {
				const text = `The invite for ${form.data.email} is saved, but the mail server did not take the message. Check the mail settings, then send the invite again.`;
				return message(form, { tone: 'heed', text }, { status: 502 });
			}
			const text = `Invite sent to ${form.data.email}. The link works for 7 days.`;
			return message(form, { tone: 'success', text });
		} catch (e) {
			return refuseForm(form, e);
		}
	},
	revokeInvite: async (event) => {
		const admin = requireRole(event, 'admin');
		const parsed = revokeInviteSchema.safeParse(
			Object.fromEntries(await postedForm(event.request))
		);
		if (!parsed.success) return fail(400, { revokeError: 'That invite is unknown.' });
		try {
			const { email } = await revokeInvite(admin, parsed.data.inviteId, event);
			return { revoked: `The invite for ${email} no longer works.` };
		} catch (e) {
			if (e instanceof NotFoundError) return fail(404, { revokeError: e.message });
			rethrowAsHttp(e);
		}
	}
};
