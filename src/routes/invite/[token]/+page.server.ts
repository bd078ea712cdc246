import { error, redirect, type RequestEvent } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { InviteGoneError } from '$lib/server/people/errors';
import { refuseForm } from '$lib/server/people/form-errors';
import { acceptInvite, findOpenInvite } from '$lib/server/people/invites';
import { acceptInviteSchema } from '$lib/schemas/account';
import type { Actions, PageServerLoad } from './$types';
import { readNewPasswordForm } from '$lib/server/forms/new-password-form';

// Public by design: the person has no account yet; the unguessable token is the permission.
// Every failure reads the same, so the page tells nothing about any other invite.
const GONE =
	"This invite link has already been used or has expired. Ask your shop's admin for a new one.";

function gone(e: InviteGoneError): never {
	error(e.reason === 'unknown' ? 404 : 410, { message: GONE });
}

function noStore(event: RequestEvent) {
	// The page carries a live token in its URL: keep it out of every cache.
	event.setHeaders({ 'cache-control': 'private, no-store' });
}

export const load: PageServerLoad = async (event) => {
	noStore(event);
	try {
		const invite = await findOpenInvite(event.params.token);
		const form = await superValidate(zod4(acceptInviteSchema), { id: 'accept' });
		return { invite, form };
	} catch (e) {
		if (e instanceof InviteGoneError) gone(e);
		throw e;
	}
};

export const actions: Actions = {
	accept: async (event) => {
		const { form, password, refused } = await readNewPasswordForm(
			event,
			zod4(acceptInviteSchema),
			'accept'
		);
		if (refused) return refused;
		let email: string;
		try {
			({ email } = await acceptInvite(event.params.token, password, event));
		} catch (e) {
			if (e instanceof InviteGoneError) gone(e);
			return refuseForm(form, e);
		}
		redirect(303, `/signin?welcome&email=${encodeURIComponent(email)}`);
	}
};
