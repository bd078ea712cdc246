import { error, redirect } from '@sveltejs/kit';
import { fail, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import {
	getRecord,
	photosFrom,
	removePhoto,
	requireEditable,
	updateRecord,
	VIEW_ROLES
} from '$lib/server/records';
import {
	refuseRecordForm,
	rethrowAsHttp,
	type RecordMessage
} from '$lib/server/records/form-errors';
import { recordTextOf } from '$lib/records/display';
import { settingsRecordSchema, type SettingsRecordForm } from '$lib/schemas/settings-record';
import { RECORD_SUGGESTIONS } from '$lib/records/typeahead';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

const adapter = zod4(settingsRecordSchema);

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...VIEW_ROLES);
	const record = await getRecord(user, Number(event.params.id)).catch(rethrowAsHttp);
	if (record.frozen)
		error(409, {
			message: 'A procedure cites this record, so it is frozen and can no longer be edited.'
		});
	if (!record.canEdit) error(403, { message: 'Your role does not allow editing this record.' });
	const text = recordTextOf(record.values, record.entered, user.unitSystem);
	const form = await superValidate<SettingsRecordForm, RecordMessage>(text, adapter, {
		id: 'record',
		errors: false
	});
	return { form, record, system: user.unitSystem, suggestions: RECORD_SUGGESTIONS };
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireRole(event, ...VIEW_ROLES);
		const id = Number(event.params.id);
		await requireEditable(user, id).catch(rethrowAsHttp);
		const data = await postedForm(event.request);
		const form = await superValidate<SettingsRecordForm, RecordMessage>(data, adapter, {
			id: 'record'
		});
		if (!form.valid) return fail(400, { form });
		try {
			await updateRecord(user, id, form.data, await photosFrom(data), event);
		} catch (e) {
			return refuseRecordForm(form, e);
		}
		redirect(303, `/records/${id}?saved=1`);
	},
	removePhoto: async (event) => {
		const user = requireRole(event, ...VIEW_ROLES);
		const id = Number(event.params.id);
		await requireEditable(user, id).catch(rethrowAsHttp);
		const photo = Number((await postedForm(event.request)).get('photo'));
		if (!Number.isSafeInteger(photo) || photo < 1)
			return fail(400, { photoError: 'Unknown photo.' });
		await removePhoto(user, id, photo, event).catch(rethrowAsHttp);
		return { removed: true };
	}
};
