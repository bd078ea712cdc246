import { redirect } from '@sveltejs/kit';
import { fail, message, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { authSignIn } from '$lib/server/auth/auth-js';
import { verifyPassword } from '$lib/server/auth/password';
import { clearFailures, isLockedOut, recordFailure } from '$lib/server/auth/failed-sign-ins';
import { formLimiter, signInLimiter } from '$lib/server/auth/rate-limit';
import { User } from '$lib/server/models';
import { START_PAGE } from '$lib/roles';
import { linkSignInSchema, signInSchema } from '$lib/schemas/account';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

// No JavaScript: both forms are plain posts (Auth.js answers with a redirect and sets the cookie)
// and every message and field error comes from the server. Signed out, there is no offline agent
// to start either.
export const csr = false;

// One message for every failure, so the form never tells whether an e-mail has an account.
const GENERIC = 'That e-mail and password do not match an active account.';

/** Only same-site paths: an open redirect would make the sign-in page a phishing tool. */
function safeRedirect(target: string | null | undefined): string {
	return target && target.startsWith('/') && !target.startsWith('//') ? target : '/';
}

export const load: PageServerLoad = async ({ locals, url }) => {
	if (locals.user) redirect(303, START_PAGE[locals.user.role]);
	const redirectTo = safeRedirect(
		url.searchParams.get('redirectTo') ?? url.searchParams.get('callbackUrl')
	);
	const form = await superValidate(
		{ email: url.searchParams.get('email') ?? '', redirectTo },
		zod4(signInSchema),
		{
			errors: false,
			id: 'password'
		}
	);
	const linkForm = await superValidate(zod4(linkSignInSchema), { id: 'link' });
	// Auth.js sends people back here with ?error= when an e-mail link is stale or refused.
	const linkError = url.searchParams.get('error')
		? 'That sign-in link is no longer valid. Ask for a new one.'
		: null;
	return { form, linkForm, linkError, welcome: url.searchParams.has('welcome') };
};

export const actions: Actions = {
	password: async (event) => {
		const data = await postedForm(event.request);
		const form = await superValidate(data, zod4(signInSchema), { id: 'password' });
		if (!form.valid) return fail(400, { form });
		form.data.password = '';
		const TOO_MANY = 'Too many attempts. Wait 15 minutes and try again.';
		if ((await signInLimiter.isLimited(event)) || (await isLockedOut(form.data.email))) {
			return message(form, TOO_MANY, { status: 429 });
		}
		const user = await User.findOne({ where: { email: form.data.email } });
		const password = String(data.get('password') ?? '');
		const ok = await verifyPassword(password, user?.active ? user.passwordHash : null);
		if (!user || !ok) {
			const locked = await recordFailure(form.data.email);
			return message(form, locked ? TOO_MANY : GENERIC, { status: 400 });
		}
		await clearFailures(form.data.email);
		// Auth.js sets the session cookie and throws the redirect to where the member was going.
		data.set('providerId', 'credentials');
		data.set(
			'redirectTo',
			safeRedirect(form.data.redirectTo) === '/'
				? START_PAGE[user.role]
				: safeRedirect(form.data.redirectTo)
		);
		return authSignIn(withForm(event, data));
	},
	link: async (event) => {
		const data = await postedForm(event.request);
		const form = await superValidate(data, zod4(linkSignInSchema), { id: 'link' });
		if (!form.valid) return fail(400, { linkForm: form });
		if (await formLimiter.isLimited(event)) {
			return message(form, 'Too many requests. Wait a minute and try again.', { status: 429 });
		}
		data.set('providerId', 'nodemailer');
		data.set('email', form.data.email);
		data.set('redirectTo', '/');
		return authSignIn(withForm(event, data));
	}
};

/** Auth.js's action reads the form itself; hand it a fresh request carrying the checked fields. */
function withForm<E extends { request: Request }>(event: E, data: FormData): E {
	const headers = new Headers(event.request.headers);
	headers.delete('content-type');
	headers.delete('content-length');
	const request = new Request(event.request.url, { method: 'POST', headers, body: data });
	return { ...event, request };
}
