// A new procedure with its first revision as a draft: blank, or spanning chosen settings records.
import type { RequestEvent } from '@sveltejs/kit';
import { Op, where, fn, col } from 'sequelize';
import type { StoredValues } from '$lib/records/display';
import type { NewProcedureForm } from '$lib/schemas/procedure';
import { variablesFromRecords } from '$lib/procedures/from-records';
import { emptyVariables } from '$lib/procedures/variables';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { lockShop } from '../db/locks';
import { Procedure, ProcedureRevision, SettingsRecord } from '../models';
import { RefusedError } from '../people/errors';
import { actingMember, actorOf, AUTHOR_ROLES } from './access';
import { syncHead } from './find';
import { setLinks } from './links';
import { audit } from '../audit';
import { auditRevision } from './revision-audit';

export async function createProcedure(
	actor: SessionUser,
	input: NewProcedureForm,
	event: RequestEvent | null = null
): Promise<{ id: number; rev: number }> {
	return write(async (t) => {
		const me = await actingMember(actor, AUTHOR_ROLES, t);
		// Numbers are unique per shop whatever their case: one check-and-create at a time.
		await lockShop(actor.shopId, t);
		const clash = await Procedure.findOne({
			where: {
				shopId: actor.shopId,
				[Op.and]: [where(fn('lower', col('number')), input.number.toLowerCase())]
			},
			transaction: t
		});
		if (clash)
			throw new RefusedError(`${input.number} is already a procedure of your shop.`, 'number');
		const records = input.recordIds.length
			? await SettingsRecord.findAll({
					where: { shopId: actor.shopId, id: { [Op.in]: input.recordIds } },
					transaction: t
				})
			: [];
		const missing = input.recordIds.filter((id) => !records.some((r) => r.id === id));
		if (missing.length)
			throw new RefusedError(
				`No settings record #${missing.join(', #')} in your shop.`,
				'recordIds'
			);
		const base = { title: input.title, code: input.code, process: input.process };
		const variables = records.length
			? variablesFromRecords(
					records.map((r) => r.get({ plain: true }) as unknown as StoredValues),
					base
				)
			: emptyVariables(base);
		const procedure = await Procedure.create(
			{
				shopId: actor.shopId,
				number: input.number,
				title: input.title,
				code: input.code,
				process: input.process,
				baseMetalFamily: variables.baseMetals.family,
				state: 'draft',
				headRev: 1,
				createdById: me.id
			},
			{ transaction: t }
		);
		const revision = await ProcedureRevision.create(
			{
				shopId: actor.shopId,
				procedureId: procedure.id,
				rev: 1,
				state: 'draft',
				variables: JSON.stringify(variables),
				process: variables.process,
				code: variables.code,
				baseMetalFamily: variables.baseMetals.family,
				authorId: me.id
			},
			{ transaction: t }
		);
		const links = await setLinks(revision, { pqrIds: [], recordIds: records.map((r) => r.id) }, t, {
			actor: actorOf(me),
			event,
			number: input.number
		});
		await syncHead(procedure.id, t);
		const who = actorOf(me);
		await audit(
			{
				shopId: actor.shopId,
				actor: who,
				action: 'procedure.created',
				objectType: 'procedure',
				objectId: procedure.id,
				after: {
					number: input.number,
					title: input.title,
					code: input.code,
					process: input.process
				}
			},
			event,
			t
		);
		await auditRevision(t, event, revision, 'created', who, {
			after: { rev: 1, state: 'draft', variables, ...links, fromRecords: links.recordIds }
		});
		return { id: procedure.id, rev: 1 };
	});
}
