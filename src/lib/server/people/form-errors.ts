import { error } from '@sveltejs/kit';
import { message, setError, type SuperValidated } from 'sveltekit-superforms';
import { ForbiddenError, NotFoundError, RefusedError } from './errors';

/** Not found and forbidden become the error page; anything else is a bug and stays a 500. */
export function rethrowAsHttp(e: unknown): never {
	if (e instanceof NotFoundError) error(404, { message: e.message });
	if (e instanceof ForbiddenError) error(403, { message: e.message });
	throw e;
}

/** A refusal lands at its field when the form has one, else as the form's message (400). */
export function refuseForm<T extends Record<string, unknown>, M>(
	form: SuperValidated<T, M>,
	e: unknown
) {
	if (!(e instanceof RefusedError)) rethrowAsHttp(e);
	if (e.field && e.field in form.data) return setError(form, e.field as never, e.message);
	return message(form, e.message as M, { status: 400 });
}
