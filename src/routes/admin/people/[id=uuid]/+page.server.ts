import { error } from '@sveltejs/kit';
import { fail, message, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import { RefusedError } from '$lib/server/people/errors';
import { refuseForm, rethrowAsHttp } from '$lib/server/people/form-errors';
import {
	changeRole,
	disableMember,
	enableMember,
	getPerson,
	signOutEverywhere
} from '$lib/server/people/members';
import { ROLE_LABELS } from '$lib/roles';
import { changeRoleSchema } from '$lib/schemas/account';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

export const load: PageServerLoad = async (event) => {
	const admin = requireRole(event, 'admin');
	const person = await getPerson(admin, event.params.id).catch(rethrowAsHttp);
	const roleForm = await superValidate(
		{ userId: person.id, role: person.role },
		zod4(changeRoleSchema),
		{ id: 'role', errors: false }
	);
	return { person, roleForm, isMe: person.id === admin.id };
};

/** The plain buttons answer with a note the page shows; refusals are 400, not an error page. */
async function act(run: () => Promise<unknown>, done: string) {
	try {
		await run();
		return { note: { tone: 'success' as const, text: done } };
	} catch (e) {
		if (e instanceof RefusedError)
			return fail(400, { note: { tone: 'error' as const, text: e.message } });
		rethrowAsHttp(e);
	}
}

export const actions: Actions = {
	changeRole: async (event) => {
		const admin = requireRole(event, 'admin');
		const form = await superValidate(await postedForm(event.request), zod4(changeRoleSchema), {
			id: 'role'
		});
		if (!form.valid) return fail(400, { form });
		// The form's hidden id must be the page's: a tampered one is simply not this person.
		if (form.data.userId !== event.params.id)
			error(404, { message: 'No such person in your shop.' });
		try {
			const p = await changeRole(admin, event.params.id, form.data.role, event);
			return message(form, {
				tone: 'success',
				text: `${p.name} is now ${ROLE_LABELS[p.role].toLowerCase()}.`
			});
		} catch (e) {
			return refuseForm(form, e);
		}
	},
	disable: async (event) => {
		const admin = requireRole(event, 'admin');
		return act(
			() => disableMember(admin, event.params.id, event),
			'Disabled. Every session of this person has ended; they cannot sign in.'
		);
	},
	enable: async (event) => {
		const admin = requireRole(event, 'admin');
		return act(
			() => enableMember(admin, event.params.id, event),
			'Enabled. They can sign in again.'
		);
	},
	signOutEverywhere: async (event) => {
		const admin = requireRole(event, 'admin');
		return act(
			() => signOutEverywhere(admin, event.params.id, event),
			'Signed out everywhere. Their next page asks them to sign in again.'
		);
	}
};
