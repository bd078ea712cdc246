// The PQRs and settings records a revision cites. Citing a record freezes it (through the
// records service's own hook), so the evidence under a procedure cannot change.
import type { RequestEvent } from '@sveltejs/kit';
import { Op, type Transaction } from 'sequelize';
import { audit } from '../audit';
import { Pqr, RevisionPqr, RevisionRecord, SettingsRecord } from '../models';
import { RefusedError } from '../people/errors';
import { freezeRecord } from '../records/save';

export interface Links {
	pqrIds: number[];
	recordIds: number[];
}

export async function linksOf(revisionId: number, shopId: number, t?: Transaction): Promise<Links> {
	const [p, r] = await Promise.all([
		RevisionPqr.findAll({ where: { revisionId, shopId }, transaction: t }),
		RevisionRecord.findAll({ where: { revisionId, shopId }, transaction: t })
	]);
	return {
		pqrIds: p.map((x) => x.pqrId).sort((a, b) => a - b),
		recordIds: r.map((x) => x.recordId).sort((a, b) => a - b)
	};
}

/** Replaces the revision's links; ids outside the shop are refused at their field. */
export async function setLinks(
	revision: { id: number; shopId: number; procedureId: number },
	links: Links,
	t: Transaction,
	by: { actor: { id: string; name: string }; event: RequestEvent | null; number: string }
): Promise<Links> {
	const shopId = revision.shopId;
	const pqrIds = [...new Set(links.pqrIds)].sort((a, b) => a - b);
	const recordIds = [...new Set(links.recordIds)].sort((a, b) => a - b);
	const [pqrs, records] = await Promise.all([
		pqrIds.length
			? Pqr.findAll({
					where: { shopId, id: { [Op.in]: pqrIds } },
					attributes: ['id'],
					transaction: t
				})
			: [],
		recordIds.length
			? SettingsRecord.findAll({
					where: { shopId, id: { [Op.in]: recordIds } },
					attributes: ['id'],
					transaction: t
				})
			: []
	]);
	const missingPqr = pqrIds.filter((id) => !pqrs.some((p) => p.id === id));
	if (missingPqr.length)
		throw new RefusedError(`No PQR ${missingPqr.join(', ')} in your shop.`, 'pqrIds');
	const missingRecord = recordIds.filter((id) => !records.some((r) => r.id === id));
	if (missingRecord.length)
		throw new RefusedError(
			`No settings record #${missingRecord.join(', #')} in your shop.`,
			'recordIds'
		);
	await RevisionPqr.destroy({ where: { revisionId: revision.id, shopId }, transaction: t });
	await RevisionRecord.destroy({ where: { revisionId: revision.id, shopId }, transaction: t });
	for (const pqrId of pqrIds)
		await RevisionPqr.create({ shopId, revisionId: revision.id, pqrId }, { transaction: t });
	for (const recordId of recordIds) {
		await RevisionRecord.create({ shopId, revisionId: revision.id, recordId }, { transaction: t });
		if (await freezeRecord(shopId, recordId, revision.procedureId, t))
			await audit(
				{
					shopId,
					actor: by.actor,
					action: 'settings_record.frozen',
					objectType: 'settings_record',
					objectId: recordId,
					before: { frozen: false },
					after: { frozen: true, citedBy: by.number, procedureId: revision.procedureId }
				},
				by.event,
				t
			);
	}
	return { pqrIds, recordIds };
}
