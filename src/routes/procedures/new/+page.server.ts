import { superValidate } from 'sveltekit-superforms';
import { zod4 } from '$lib/forms/zod4';
import { requireRole } from '$lib/server/auth/guards';
import { SettingsRecord } from '$lib/server/models';
import { shopDefaultCode } from '$lib/server/people/shop-settings';
import { procedureCodeFor } from '$lib/procedures/default-code';
import { AUTHOR_ROLES, createProcedure, nextNumber } from '$lib/server/procedures';
import { newProcedureSchema } from '$lib/schemas/procedure';
import { PROCESSES } from '$lib/records/options';
import type { Actions, PageServerLoad } from './$types';
import { saveThenShow } from '$lib/server/procedures/save-form';

const schema = zod4(newProcedureSchema);

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, ...AUTHOR_ROLES);
	const params = event.url.searchParams;
	const picked = (params.get('records') ?? params.get('fromRecord') ?? '')
		.split(',')
		.map(Number)
		.filter((n) => Number.isInteger(n) && n > 0)
		.slice(0, 50);
	const records = await SettingsRecord.findAll({
		where: { shopId: user.shopId },
		order: [
			['weldedOn', 'DESC'],
			['id', 'DESC']
		],
		limit: 200
	});
	const first = records.find((r) => picked.includes(r.id));
	const asked = params.get('process');
	const process = (PROCESSES as readonly string[]).includes(asked ?? '')
		? (asked as (typeof PROCESSES)[number])
		: (first?.process ?? 'GTAW');
	const form = await superValidate(
		{
			number: await nextNumber(user.shopId, 'wps', process),
			code: procedureCodeFor(await shopDefaultCode(user.shopId)),
			process,
			recordIds: records.filter((r) => picked.includes(r.id)).map((r) => r.id)
		},
		schema,
		{ errors: false }
	);
	return {
		form,
		system: user.unitSystem,
		records: records.map((r) => ({
			id: r.id,
			weldedOn: r.weldedOn,
			process: r.process,
			amps: r.amps,
			thicknessMm: r.thicknessMm,
			fillerClass: r.fillerClass,
			baseMetalSpec: r.baseMetalSpec,
			position: r.position,
			outcomeKind: r.outcomeKind,
			frozen: r.frozenAt !== null
		}))
	};
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireRole(event, ...AUTHOR_ROLES);
		return saveThenShow(event, schema, async (data) => {
			const { id } = await createProcedure(user, data, event);
			return `/procedures/${id}/revisions/1/edit?created=1`;
		});
	}
};
