// How procedure and PQR pages turn a service's refusal into an answer: 404/403 pages, or a
// message on the form (409 when someone decided first) with every typed value kept.
import { error } from '@sveltejs/kit';
import { message, setError, type SuperValidated } from 'sveltekit-superforms';
import { ForbiddenError, NotFoundError, RefusedError } from '../people/errors';
import { AlreadyDecidedError } from './access';

export function rethrowAsHttp(e: unknown): never {
	if (e instanceof NotFoundError) error(404, { message: e.message });
	if (e instanceof ForbiddenError) error(403, { message: e.message });
	throw e;
}

/** A refusal at its field when the form has one, else as the form's message. */
export function refuse<T extends Record<string, unknown>>(
	form: SuperValidated<T, string>,
	e: unknown
) {
	if (e instanceof AlreadyDecidedError) return message(form, e.message, { status: 409 });
	if (e instanceof ForbiddenError && form.id !== 'plain')
		return message(form, e.message, { status: 403 });
	if (!(e instanceof RefusedError)) rethrowAsHttp(e);
	if (e.field && e.field in form.data) return setError(form, e.field as never, e.message);
	return message(form, e.message, { status: 400 });
}

/** For the plain (non-superforms) buttons: the refusal's words and a status. */
export function refusal(e: unknown): { status: number; message: string } {
	if (e instanceof AlreadyDecidedError) return { status: 409, message: e.message };
	if (e instanceof RefusedError) return { status: 400, message: e.message };
	rethrowAsHttp(e);
}
