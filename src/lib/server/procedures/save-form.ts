// The save action of the procedure and PQR forms (new procedure, new PQR, the revision editor,
// the PQR editor): read the posted form, give it back with its field errors (400) when it does
// not validate, refuse with the service's reason (refuse), or go where the saved thing is shown.
// The caller guards first, so a role that may never save is refused before the body is read.
import { redirect, type RequestEvent } from '@sveltejs/kit';
import { fail, superValidate } from 'sveltekit-superforms';
import type { ValidationAdapter } from 'sveltekit-superforms/adapters';
import { postedForm } from '$lib/server/forms/posted-form';
import { refuse } from './form-errors';

/** `save` stores the form's data and answers the address to show next. */
export async function saveThenShow<
	T extends Record<string, unknown>,
	In extends Record<string, unknown> = T
>(event: RequestEvent, adapter: ValidationAdapter<T, In>, save: (data: T) => Promise<string>) {
	const form = await superValidate(await postedForm(event.request), adapter);
	if (!form.valid) return fail(400, { form });
	let next: string;
	try {
		next = await save(form.data);
	} catch (e) {
		return refuse(form, e);
	}
	redirect(303, next);
}
