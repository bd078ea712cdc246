// How the record pages turn a service's refusal into an answer: 404/403 pages, or a message on
// the form with every typed value kept.
import { error } from '@sveltejs/kit';
import { message, type SuperValidated } from 'sveltekit-superforms';
import type { SettingsRecordForm } from '$lib/schemas/settings-record';
import { ForbiddenError, NotFoundError, RefusedError } from '../people/errors';

export type RecordMessage = { text: string; field?: string };

export function rethrowAsHttp(e: unknown): never {
	if (e instanceof NotFoundError) error(404, { message: e.message });
	if (e instanceof ForbiddenError) error(403, { message: e.message });
	throw e;
}

export function refuseRecordForm(
	form: SuperValidated<SettingsRecordForm, RecordMessage>,
	e: unknown
) {
	if (!(e instanceof RefusedError)) rethrowAsHttp(e);
	return message(form, { text: e.message, field: e.field }, { status: 400 });
}
