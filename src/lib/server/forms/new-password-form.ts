// The posted form of sign-up and of invite acceptance, which both set a new password: the
// password is taken out of the form at once so that it never travels back into the page (valid
// or not), a form that does not validate is a 400 with its field errors, and an address that
// posts too often is told to wait (429) before any account is touched.
import type { RequestEvent } from '@sveltejs/kit';
import { fail, message, superValidate, type SuperValidated } from 'sveltekit-superforms';
import type { ValidationAdapter } from 'sveltekit-superforms/adapters';
import { formLimiter } from '$lib/server/auth/rate-limit';
import { postedForm } from './posted-form';

type PasswordPair = { password: string; confirm: string };

export async function readNewPasswordForm<
	T extends PasswordPair,
	In extends Record<string, unknown> = T
>(event: RequestEvent, adapter: ValidationAdapter<T, In>, id: string) {
	const form: SuperValidated<T> = await superValidate(await postedForm(event.request), adapter, {
		id
	});
	const { password } = form.data;
	form.data.password = '';
	form.data.confirm = '';
	if (!form.valid) return { form, password, refused: fail(400, { form }) };
	if (await formLimiter.isLimited(event)) {
		const wait = 'Too many attempts from here. Wait a minute and try again.';
		return { form, password, refused: message(form, wait, { status: 429 }) };
	}
	return { form, password, refused: null };
}
