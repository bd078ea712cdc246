// Sheet PDF downloads go on the append-only trail, like lab report downloads: who printed which
// signed revision, on what paper, and whether it still matched its signature (a mismatch is also
// written as the revision's tamper event, as every view of it does).
import { error, type RequestEvent } from '@sveltejs/kit';
import { Op, type Transaction } from 'sequelize';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { ForbiddenError } from '../people/errors';
import { Procedure, ProcedureRevision } from '../models';
import { actingMember, actorOf, VIEW_ROLES } from './access';
import { checkIntegrity } from './digest';

/** What the routes know of each printed sheet (the sheet input's own fields). */
export interface PrintedSheet {
	number: string;
	rev: number;
	intact: boolean;
	paper: 'a4' | 'letter';
}

/** The revision rows of the printed sheets, by procedure number and revision number. */
async function revisionsOf(shopId: number, sheets: PrintedSheet[], t: Transaction) {
	const procedures = await Procedure.findAll({
		where: { shopId, number: { [Op.in]: [...new Set(sheets.map((s) => s.number))] } },
		attributes: ['id', 'number'],
		transaction: t
	});
	const rows = procedures.length
		? await ProcedureRevision.findAll({
				where: { shopId, procedureId: { [Op.in]: procedures.map((p) => p.id) } },
				attributes: ['id', 'procedureId', 'rev'],
				transaction: t
			})
		: [];
	return sheets.map((s) => {
		const p = procedures.find((x) => x.number === s.number);
		const r = rows.find((x) => x.procedureId === p?.id && x.rev === s.rev);
		return { ...s, procedureId: p?.id ?? null, revisionId: r?.id ?? null };
	});
}

async function tamperEvents(
	shopId: number,
	who: { id: string; name: string },
	revisionIds: number[],
	event: RequestEvent | null,
	t: Transaction
) {
	for (const id of revisionIds) {
		const i = await checkIntegrity(id, t);
		if (i.ok) continue;
		await audit(
			{
				shopId,
				actor: who,
				action: 'procedure_revision.tamper_detected',
				objectType: 'procedure_revision',
				objectId: id,
				before: { digest: i.signedDigest },
				after: { digest: i.computedDigest, problems: i.problems, seenIn: 'sheet' }
			},
			event,
			t
		);
	}
}

/** One sheet: `procedure_sheet.downloaded` on the revision printed. */
export async function recordSheetDownload(
	actor: SessionUser,
	sheet: PrintedSheet,
	event: RequestEvent | null = null
): Promise<void> {
	await write(async (t) => {
		const me = actorOf(await actingMember(actor, VIEW_ROLES, t));
		const [s] = await revisionsOf(actor.shopId, [sheet], t);
		await audit(
			{
				shopId: actor.shopId,
				actor: me,
				action: 'procedure_sheet.downloaded',
				objectType: 'procedure_revision',
				objectId: s!.revisionId,
				after: {
					procedureId: s!.procedureId,
					number: s!.number,
					rev: s!.rev,
					revisionId: s!.revisionId,
					paper: s!.paper,
					intact: s!.intact
				}
			},
			event,
			t
		);
		if (!s!.intact && s!.revisionId)
			await tamperEvents(actor.shopId, me, [s!.revisionId], event, t);
	});
}

/** The batch of current sheets: one `procedure_sheet.batch_downloaded` listing every revision. */
export async function recordSheetBatchDownload(
	actor: SessionUser,
	sheets: PrintedSheet[],
	event: RequestEvent | null = null
): Promise<void> {
	await write(async (t) => {
		const me = actorOf(await actingMember(actor, VIEW_ROLES, t));
		const found = await revisionsOf(actor.shopId, sheets, t);
		const ids = (xs: typeof found) => xs.flatMap((s) => (s.revisionId ? [s.revisionId] : []));
		await audit(
			{
				shopId: actor.shopId,
				actor: me,
				action: 'procedure_sheet.batch_downloaded',
				objectType: 'procedure_sheets',
				objectId: null,
				after: {
					sheets: found.length,
					paper: sheets[0]?.paper ?? null,
					revisionIds: ids(found),
					revisions: found.map((s) => `${s.number} rev ${s.rev}`),
					notIntact: ids(found.filter((s) => !s.intact)),
					// Every sheet in the PDF, in print order, as fully as the one-sheet event names it
					// (a revision not found again still shows by number and rev).
					printed: found.map((s) => ({
						procedureId: s.procedureId,
						number: s.number,
						rev: s.rev,
						revisionId: s.revisionId,
						intact: s.intact
					}))
				}
			},
			event,
			t
		);
		await tamperEvents(actor.shopId, me, ids(found.filter((s) => !s.intact)), event, t);
	});
}

/**
 * Runs the recording for a route: no trail entry, no PDF. A member no longer allowed is a 403;
 * a trail that cannot be written now (disk, lock) is a 503 to retry, never a 500.
 */
export async function recordedOrRefused(record: () => Promise<void>): Promise<void> {
	try {
		await record();
	} catch (e) {
		if (e instanceof ForbiddenError) error(403, { message: e.message });
		console.error('sheet download not recorded', e);
		error(503, { message: 'The download could not be written to the audit trail; try again.' });
	}
}
