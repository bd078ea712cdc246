import { redirect } from '@sveltejs/kit';
import { fail, superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import { createRecord, CREATE_ROLES, photosFrom } from '$lib/server/records';
import { refuseRecordForm, type RecordMessage } from '$lib/server/records/form-errors';
import { settingsRecordSchema } from '$lib/schemas/settings-record';
import { RECORD_SUGGESTIONS } from '$lib/records/typeahead';
import type { Actions, PageServerLoad } from './$types';
import { postedForm } from '$lib/server/forms/posted-form';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...CREATE_ROLES);
	const form = await superValidate<typeof settingsRecordSchema._zod.output, RecordMessage>(
		{ units: user.unitSystem, weldedOn: new Date().toISOString().slice(0, 10) },
		zod4(settingsRecordSchema),
		{ id: 'record', errors: false }
	);
	return { form, system: user.unitSystem, suggestions: RECORD_SUGGESTIONS };
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireRole(event, ...CREATE_ROLES);
		const data = await postedForm(event.request);
		const form = await superValidate<typeof settingsRecordSchema._zod.output, RecordMessage>(
			data,
			zod4(settingsRecordSchema),
			{ id: 'record' }
		);
		if (!form.valid) return fail(400, { form });
		let id: number;
		try {
			({ id } = await createRecord(user, form.data, await photosFrom(data), event));
		} catch (e) {
			return refuseRecordForm(form, e);
		}
		redirect(303, `/records/${id}?saved=1`);
	}
};
