import { json } from '@sveltejs/kit';
import { api, apiMember, readBody } from '$lib/server/api/respond';
import { getRecord, recordJson, updateRecord, VIEW_ROLES } from '$lib/server/records';
import { recordTextOf } from '$lib/records/display';
import type { RecordView } from '$lib/server/records';
import type { UnitSystem } from '$lib/weld';
import { flattenApiBody, settingsRecordSchema } from '$lib/schemas/settings-record';
import { z } from 'zod';
import { apiFailureFor } from '../api-errors';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...VIEW_ROLES);
	try {
		return json(recordJson(await getRecord(user, Number(event.params.id))));
	} catch (e) {
		throw apiFailureFor(e);
	}
});

/**
 * The stored record as text to merge the changes into: as typed where the units agree, else the
 * exact SI value with its unit, so untouched fields come back unchanged.
 */
function patchBase(r: RecordView, units: UnitSystem) {
	const v = r.values;
	const si = (n: number | null, unit: string) => (n === null ? '' : `${n} ${unit}`);
	const typed = r.entered.units === units ? (r.entered.fields ?? {}) : {};
	const exact = {
		wireFeed: si(v.wireFeedMmPerS, 'mm/s'),
		travelSpeed: si(v.travelSpeedMmPerS, 'mm/s'),
		fillerDiameter: si(v.fillerDiameterMm, 'mm'),
		tungstenDiameter: si(v.tungstenDiameterMm, 'mm'),
		gasFlow: si(v.gasFlowLPerMin, 'L/min'),
		thickness: si(v.thicknessMm, 'mm'),
		preheat: si(v.preheatC, 'degC'),
		interpass: si(v.interpassC, 'degC')
	};
	return { ...recordTextOf(v, {}, units), ...exact, ...typed, units };
}

const patchSchema = z.record(z.string(), z.unknown());

/** Changes the fields given; the rest keep their stored values. Same schema as POST. */
export const PATCH: RequestHandler = api(async (event) => {
	const user = await apiMember(event, ...VIEW_ROLES);
	const id = Number(event.params.id);
	const changes = await readBody(event, patchSchema);
	try {
		const current = await getRecord(user, id);
		const flat = flattenApiBody(changes) as Record<string, unknown>;
		const units =
			flat.units === 'metric' || flat.units === 'imperial'
				? flat.units
				: (current.entered.units ?? 'imperial');
		const merged = { ...patchBase(current, units), ...flat };
		const parsed = settingsRecordSchema.safeParse(merged);
		if (!parsed.success) {
			const errors: Record<string, string[]> = {};
			for (const i of parsed.error.issues) (errors[i.path.join('.')] ??= []).push(i.message);
			return json({ errors }, { status: 400 });
		}
		await updateRecord(user, id, parsed.data, [], event);
		return json(recordJson(await getRecord(user, id)));
	} catch (e) {
		throw apiFailureFor(e);
	}
});
