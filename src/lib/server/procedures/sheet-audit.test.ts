// Sheet PDF downloads on the audit trail: one sheet, the batch of current sheets, a tampered
// revision printed, and the routes' answers when the trail cannot be written.
import { isHttpError } from '@sveltejs/kit';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-sheet-audit-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { AuditEvent, ProcedureRevision } = await import('../models');
const { ForbiddenError } = await import('../people/errors');
const { currentSheets, sheetFor } = await import('../booth');
const svc = await import('./index');
const T = await import('./test-support');

type People = Awaited<ReturnType<typeof T.shopWithPeople>>;
let a: People;
const quiet = { notify: false };

beforeAll(async () => {
	a = await T.shopWithPeople('Sheet Audit Shop');
});

async function approved(n: string) {
	const { id } = await svc.createProcedure(a.engineer, {
		number: `WPS-SA-${n}`,
		title: 'GTAW fillet',
		code: 'aws-d1.1',
		process: 'GTAW',
		recordIds: []
	});
	await svc.updateDraft(a.engineer, id, 1, T.revisionForm());
	await svc.submitRevision(a.engineer, id, 1, null, quiet);
	await svc.approveRevision(a.inspector, id, 1, { password: T.PASSWORD, comment: '' }, null, quiet);
	const r = await ProcedureRevision.findOne({ where: { procedureId: id, rev: 1 } });
	return { id, revisionId: r!.id };
}

const eventsOf = (action: string) =>
	AuditEvent.findAll({ where: { shopId: a.shopId, action }, order: [['id', 'ASC']] });

describe('sheet downloads', () => {
	it('records one sheet on the revision printed, with who, paper and that it matched', async () => {
		const { id, revisionId } = await approved('ONE');
		const input = await sheetFor(a.shopId, id, { paper: 'a4' });
		await svc.recordSheetDownload(a.inspector, input);
		const [e] = (await eventsOf('procedure_sheet.downloaded')).filter(
			(x) => x.objectId === String(revisionId)
		);
		expect(e).toMatchObject({ objectType: 'procedure_revision', actorName: a.inspector.name });
		expect(JSON.parse(e!.after!)).toEqual({
			procedureId: id,
			number: 'WPS-SA-ONE',
			rev: 1,
			revisionId,
			paper: 'a4',
			intact: true
		});
		// It shows on the procedure's own trail.
		const trail = await svc.procedureTrail(a.admin, id);
		expect(trail.some((x) => x.action === 'procedure_sheet.downloaded')).toBe(true);
	});

	it('records a tampered sheet as not intact, and the tamper itself', async () => {
		const { id, revisionId } = await approved('BAD');
		await T.tamperWithRevision(revisionId);
		const input = await sheetFor(a.shopId, id, {});
		expect(input.intact).toBe(false);
		await svc.recordSheetDownload(a.engineer, input);
		const [e] = (await eventsOf('procedure_sheet.downloaded')).filter(
			(x) => x.objectId === String(revisionId)
		);
		expect(JSON.parse(e!.after!)).toMatchObject({ intact: false, paper: 'letter' });
		const tamper = (await eventsOf('procedure_revision.tamper_detected')).filter(
			(x) => x.objectId === String(revisionId)
		);
		expect(tamper).toHaveLength(1);
		expect(JSON.parse(tamper[0]!.after!)).toMatchObject({ seenIn: 'sheet' });
	});

	it('records the batch once, listing every revision in force', async () => {
		const { revisionId } = await approved('BATCH');
		const { sheets } = await currentSheets(a.shopId, {});
		await svc.recordSheetBatchDownload(a.admin, sheets);
		const [e] = await eventsOf('procedure_sheet.batch_downloaded');
		expect(e).toMatchObject({ objectType: 'procedure_sheets', objectId: null });
		const after = JSON.parse(e!.after!);
		expect(after.sheets).toBe(sheets.length);
		expect(after.revisionIds).toHaveLength(sheets.length);
		expect(after.revisionIds).toContain(revisionId);
		expect(after.revisions).toContain('WPS-SA-BATCH rev 1');
		// The tampered one from the test before is in force still and printed as such.
		expect(after.notIntact).toHaveLength(1);
		// Every printed revision is named in full, in print order.
		expect(after.printed).toHaveLength(sheets.length);
		expect(
			after.printed.map((p: { number: string; rev: number }) => `${p.number} rev ${p.rev}`)
		).toEqual(sheets.map((s) => `${s.number} rev ${s.rev}`));
		expect(after.printed).toContainEqual(
			expect.objectContaining({ number: 'WPS-SA-BATCH', rev: 1, revisionId, intact: true })
		);
	});

	it('answers 403 for a member no longer allowed and 503 when the trail cannot be written', async () => {
		const status = async (fn: () => Promise<void>) => {
			try {
				await svc.recordedOrRefused(fn);
				return 200;
			} catch (e) {
				return isHttpError(e) ? e.status : 500;
			}
		};
		expect(await status(async () => {})).toBe(200);
		expect(
			await status(async () => {
				throw new ForbiddenError('Your account is no longer active.');
			})
		).toBe(403);
		const quietError = console.error;
		console.error = () => {};
		try {
			expect(
				await status(async () => {
					throw new Error('SQLITE_FULL');
				})
			).toBe(503);
		} finally {
			console.error = quietError;
		}
		const welder = { ...a.welder };
		expect(
			await status(() =>
				svc.recordSheetDownload(welder, { number: 'x', rev: 1, intact: true, paper: 'a4' })
			)
		).toBe(403);
	});
});
