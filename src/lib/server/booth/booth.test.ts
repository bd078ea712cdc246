import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { pdfQr, pdfText } from '../../../../tests/support/pdf';

const dir = mkdtempSync(join(tmpdir(), 'beadline-booth-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');
process.env.ORIGIN = 'http://booth.test';

const { AuditEvent, BoothLink, BoothLookup, ContinuityEntry, ProcedureRevision, Welder } =
	await import('../models');
const { sequelize } = await import('../db/sequelize');
const { ForbiddenError, NotFoundError, RefusedError } = await import('../people/errors');
const procedures = await import('../procedures');
const T = await import('../procedures/test-support');
const booth = await import('./index');
const { procedureSheetPdf, procedureSheetsPdf } = await import('../pdf/procedure-sheet');

type People = Awaited<ReturnType<typeof T.shopWithPeople>>;
let a: People, b: People;
const quiet = { notify: false };

beforeAll(async () => {
	a = await T.shopWithPeople('Booth Shop');
	b = await T.shopWithPeople('Other Booth Shop');
});

/** A procedure with revision 1 approved (and, with `twice`, revision 2 approved over it). */
async function approved(people = a, twice = false) {
	const { id } = await procedures.createProcedure(people.engineer, {
		number: `WPS-${Math.random().toString(36).slice(2, 7)}`,
		title: 'GTAW fillet',
		code: 'aws-d1.1',
		process: 'GTAW',
		recordIds: []
	});
	const sign = async (rev: number) => {
		await procedures.updateDraft(people.engineer, id, rev, T.revisionForm());
		await procedures.submitRevision(people.engineer, id, rev, null, quiet);
		await procedures.approveRevision(
			people.inspector,
			id,
			rev,
			{ password: T.PASSWORD, comment: '' },
			null,
			quiet
		);
	};
	await sign(1);
	if (twice) {
		await procedures.startRevision(people.engineer, id);
		await sign(2);
	}
	return id;
}

const liveToken = async (procedureId: number, rev: number) => {
	const links = await booth.linksOfProcedure(a.admin, procedureId);
	const path = links.revisions.find((r) => r.rev === rev)?.live?.path;
	return path?.split('/').pop() ?? '';
};

describe('booth links', () => {
	it('are issued when a revision is approved: 24 URL-safe characters (144 bits), unique', async () => {
		const id = await approved();
		const links = await BoothLink.findAll({ where: { procedureId: id } });
		expect(links).toHaveLength(1);
		expect(links[0]?.token).toMatch(/^[A-Za-z0-9_-]{24}$/);
		expect(booth.newBoothToken()).not.toBe(booth.newBoothToken());
	});

	it('resolve to the live state; a superseded revision points at the one in force', async () => {
		const id = await approved(a, true);
		const old = await booth.resolveBoothToken(await liveToken(id, 1));
		expect(old).toMatchObject({ rev: 1, state: 'superseded', supersededByRev: 2 });
		expect(old?.current?.rev).toBe(2);
		expect(old?.current?.path).toBe(`/b/${await liveToken(id, 2)}`);
		const now = await booth.resolveBoothToken(await liveToken(id, 2));
		expect(now).toMatchObject({ rev: 2, state: 'approved', current: null, shopName: 'Booth Shop' });
		expect(await booth.resolveBoothToken('not-a-token')).toBeNull();
		expect(await booth.resolveBoothToken('A'.repeat(24))).toBeNull();
	});

	it('an admin withdraws and reissues a link; the old one reads as withdrawn', async () => {
		const id = await approved();
		const first = await liveToken(id, 1);
		const r = await booth.revokeBoothLink(a.admin, id, 1, { reissue: true });
		expect(r.revoked).toBe(1);
		expect(r.token).not.toBe(first);
		expect((await booth.resolveBoothToken(first))?.link.revoked).toBe(true);
		expect((await booth.resolveBoothToken(r.token!))?.link.revoked).toBe(false);
		await booth.revokeBoothLink(a.admin, id, 1, { reissue: false });
		expect((await booth.linksOfProcedure(a.admin, id)).revisions[0]?.live).toBeNull();
		await expect(booth.revokeBoothLink(a.admin, id, 1, { reissue: false })).rejects.toThrow(
			RefusedError
		);
		const actions = await AuditEvent.findAll({
			where: { shopId: a.shopId, objectType: 'procedure_revision' }
		});
		expect(actions.map((e) => e.action)).toContain('booth_link.reissued');
		expect(actions.map((e) => e.action)).toContain('booth_link.revoked');
	});

	it('only an admin of the same shop may withdraw; another shop gets "not found"', async () => {
		const id = await approved();
		await expect(booth.revokeBoothLink(a.engineer, id, 1, { reissue: true })).rejects.toThrow(
			ForbiddenError
		);
		await expect(booth.revokeBoothLink(b.admin, id, 1, { reissue: true })).rejects.toThrow(
			NotFoundError
		);
		await expect(booth.sheetFor(b.shopId, id)).rejects.toThrow(NotFoundError);
	});
});

describe('lookups', () => {
	const event = (ip = '10.0.0.7') =>
		({
			locals: { user: null },
			request: new Request('http://booth.test/b/x', { headers: { 'user-agent': 'phone' } }),
			getClientAddress: () => ip
		}) as unknown as Parameters<typeof booth.logLookup>[0];

	it('are logged in batches with the address, and counted per link', async () => {
		const id = await approved();
		const link = (await BoothLink.findOne({ where: { procedureId: id } }))!;
		booth.logLookup(event(), { shopId: a.shopId, linkId: link.id, outcome: 'ok' });
		booth.logLookup(event(), { shopId: a.shopId, linkId: link.id, outcome: 'ok' });
		booth.logLookup(event(), { shopId: null, linkId: null, outcome: 'unknown' });
		const counts = await booth.lookupCounts(a.shopId, [link.id]);
		expect(counts.get(link.id)?.count).toBe(2);
		const row = await BoothLookup.findOne({ where: { linkId: link.id } });
		expect(row).toMatchObject({ ip: '10.0.0.7', userAgent: 'phone', outcome: 'ok', hits: 2 });
		expect(await BoothLookup.count({ where: { outcome: 'unknown' } })).toBe(1);
	});

	it('log a burst once per link and window, however many batches race to write it', async () => {
		const id = await approved();
		const link = (await BoothLink.findOne({ where: { procedureId: id } }))!;
		const tap = () =>
			booth.logLookup(event(), { shopId: a.shopId, linkId: link.id, outcome: 'ok' });
		// Five batches of ten flushed at once stand for five processes serving one burst.
		const flushes: Promise<void>[] = [];
		for (let b = 0; b < 5; b++) {
			for (let i = 0; i < 10; i++) tap();
			flushes.push(booth.flushLookups());
		}
		await Promise.all(flushes);
		const rows = await BoothLookup.findAll({ where: { linkId: link.id } });
		// A burst that crossed a window boundary while it ran would make two rows.
		const windows = new Set(rows.map((r) => r.windowStart)).size;
		expect(rows).toHaveLength(windows);
		expect(rows.reduce((n, r) => n + r.hits, 0)).toBe(50);
		expect((await booth.lookupCounts(a.shopId, [link.id])).get(link.id)?.count).toBe(50);
		expect(rows[0]!.windowStart! % booth.LOOKUP_WINDOW_MS).toBe(0);
	});
});

describe('the sheet from the database', () => {
	it('prints the signature and a QR code of exactly the revision’s booth link', async () => {
		const id = await approved();
		const input = await booth.sheetFor(a.shopId, id);
		expect(input.url).toBe(`http://booth.test/b/${await liveToken(id, 1)}`);
		expect(input.paper).toBe('letter');
		const bytes = await procedureSheetPdf(input);
		const text = (await pdfText(bytes)).replace(/\s+/g, ' ');
		expect(text).toContain('Booth Shop Inspector');
		expect(text).toContain('Approved');
		expect(text).toMatch(/\d{4}-\d\d-\d\d \d\d:\d\d UTC/);
		expect(await pdfQr(bytes, 1, 2)).toBe(input.url);
	});

	it('prints every revision in force in one batch, and refuses a procedure with none', async () => {
		const { sheets } = await booth.currentSheets(a.shopId, { paper: 'a4' });
		expect(sheets.length).toBeGreaterThan(2);
		expect(sheets.every((s) => s.state === 'approved' && s.paper === 'a4')).toBe(true);
		expect((await procedureSheetsPdf('batch', sheets)).length).toBeGreaterThan(1000);
		const { id } = await procedures.createProcedure(a.engineer, {
			number: 'WPS-DRAFT-ONLY',
			title: 'Draft',
			code: 'shop',
			process: 'GMAW',
			recordIds: []
		});
		await expect(booth.sheetFor(a.shopId, id)).rejects.toThrow(/no sheet to print/);
	});
});

describe('one-tap continuity', () => {
	it('logs the process once a day for the welder linked to the account', async () => {
		const id = await approved();
		const status = (await booth.resolveBoothToken(await liveToken(id, 1)))!;
		await expect(booth.tapContinuity(a.welder, status, null)).rejects.toThrow(booth.NO_WELDER);
		const w = await Welder.create({
			shopId: a.shopId,
			name: 'Booth Welder',
			stamp: 'BW-1',
			userId: a.welder.id
		});
		const first = await booth.tapContinuity(a.welder, status, null);
		const again = await booth.tapContinuity(a.welder, status, null);
		expect(first).toMatchObject({ process: 'GTAW', created: true, source: 'booth' });
		expect(again.created).toBe(false);
		expect(await ContinuityEntry.count({ where: { welderId: w.id } })).toBe(1);
		const view = await booth.memberView(a.welder, status, null);
		expect(view.welder).toEqual({ name: 'Booth Welder', loggedToday: true });
		expect(view.shade).toMatchObject({ minimum: 8, suggested: 12 });
	});

	it('is refused on a superseded revision', async () => {
		const id = await approved(a, true);
		const status = (await booth.resolveBoothToken(await liveToken(id, 1)))!;
		await expect(booth.tapContinuity(a.welder, status, null)).rejects.toThrow(
			/not the one in force/
		);
	});
});

describe('the member view', () => {
	it('verifies the signature on every view, with one read of each row', async () => {
		const id = await approved();
		const status = (await booth.resolveBoothToken(await liveToken(id, 1)))!;
		let queries = 0;
		sequelize.addHook('beforeQuery', 'count', () => void queries++);
		const clean = await booth.memberView(a.welder, status, null).finally(() => {
			sequelize.removeHook('beforeQuery', 'count');
		});
		expect(clean.intact).toBe(true);
		expect(clean.signOff?.meaning).toBe('Approved');
		// Revision, sign-offs, PQR links, cited records, the welder with today's log: nothing twice.
		expect(queries).toBe(5);
		const row = await ProcedureRevision.findOne({ where: { procedureId: id, rev: 1 } });
		const tamperEvents = await T.tamperWithRevision(row!.id);
		expect((await booth.memberView(a.welder, status, null)).intact).toBe(false);
		expect(await tamperEvents()).toBe(1);
		// Nothing is kept from one view to the next: the next scan checks again, and reports again.
		expect((await booth.memberView(a.welder, status, null)).intact).toBe(false);
		expect(await tamperEvents()).toBe(2);
	});
});
