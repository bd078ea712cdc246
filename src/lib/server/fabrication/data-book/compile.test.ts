import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { pdfQr, pdfText } from '../../../../../tests/support/pdf';
import { readAll, unzip } from '$lib/test-support/unzip';

const dir = mkdtempSync(join(tmpdir(), 'beadline-data-book-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { AuditEvent, DataBook, JointInspection } = await import('../../models');
const { ForbiddenError, NotFoundError } = await import('../../people/errors');
const { saveUpload } = await import('../../storage');
const P = await import('../../procedures/test-support');
const svc = await import('../index');
const T = await import('../test-support');
const { compileDataBook, dataBookUrl } = await import('./compile');
const { checkFiles, MANIFEST_NAME, parseManifest, sha256Hex } = await import('./manifest');
const { checkDataBook } = await import('./verify');
const { checkCopy, CopyRefused } = await import('./check-copy');
const { zipStream } = await import('./zip');
const { dataBooksOf } = await import('./list');

type People = Awaited<ReturnType<typeof P.shopWithPeople>>;
let a: People;
let jobId: number;
let wps: { id: number; number: string };
const joints: Record<string, number> = {};
const REPORT = Buffer.from(
	'%PDF-1.4\n1 0 obj<</Type/Catalog>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n'
);
const squash = (s: string) => s.replace(/\s+/g, ' ');

beforeAll(async () => {
	a = await P.shopWithPeople('Data Book Shop');
	wps = await T.approvedProcedure(a);
	({ id: jobId } = await T.newJob(a, {
		customer: 'Invented Rail Co',
		part: 'Bogie frame',
		drawing: 'D-771',
		drawingRev: 'C'
	}));
	await svc.importJoints(
		a.engineer,
		jobId,
		`mark,type,position,procedure\nW1,tee,2F,${wps.number}\nW2,tee,2F,${wps.number}\n`
	);
	for (const j of (await svc.jobView(a.engineer, jobId)).joints) joints[j.mark] = j.id;
	await T.linkedWelder(a, a.welder, {}, 'DB-07');
	await svc.logWeld(a.welder, { jointId: joints.W1!, passes: ['root', 'fill', 'cap'] });
	await svc.recordInspection(a.inspector, {
		jointId: joints.W1!,
		method: 'VT',
		extent: '100 %',
		result: 'accept',
		note: '',
		password: P.PASSWORD
	});
	// An inspection with an uploaded report, as the report upload stores it (the same signed
	// columns as the inspection above; the row is append-only, so it is written whole).
	const upload = await saveUpload(REPORT, { accept: ['application/pdf'], maxBytes: 1e6 });
	const signed = (await JointInspection.findOne({ where: { jointId: joints.W1! } }))!.get();
	await JointInspection.create({
		...signed,
		id: undefined,
		method: 'RT',
		reportKey: upload.key,
		reportName: 'RT film report.pdf',
		reportSha256: sha256Hex(REPORT)
	});
});

async function compiled(who = a.engineer) {
	const book = await compileDataBook(who, jobId);
	const zip = await readAll(book.zip());
	return { book, files: await unzip(zip) };
}

describe('the data book', () => {
	it('is compiled by engineers, inspectors and admins of the shop only', async () => {
		await expect(compileDataBook(a.welder, jobId)).rejects.toThrow(ForbiddenError);
		const other = await P.shopWithPeople('Other Data Book Shop');
		await expect(compileDataBook(other.engineer, jobId)).rejects.toThrow(NotFoundError);
		expect(await DataBook.count()).toBe(0);
	});

	it('holds the weld map, the procedure sheet, the welder card and the report, each digest in the manifest', async () => {
		const { book, files } = await compiled(a.inspector);
		const names = [...files.keys()];
		expect(names[0]).toMatch(/^weld-map-and-log-J-.*\.pdf$/);
		expect(names.filter((n) => n.startsWith('procedures/'))).toHaveLength(1);
		expect(names.filter((n) => n.startsWith('welders/'))).toHaveLength(1);
		expect(names.filter((n) => n.startsWith('inspection-reports/'))).toEqual([
			expect.stringMatching(/^inspection-reports\/W1-\d+-RT-film-report\.pdf$/)
		]);
		expect(names.at(-1)).toBe(MANIFEST_NAME);
		// Every digest verified against the bytes yauzl read back.
		const text = files.get(MANIFEST_NAME)!.toString('utf8');
		const manifest = parseManifest(text)!;
		const found = new Map(
			[...files].map(([n, b]) => [n, { sha256: sha256Hex(b), bytes: b.length }])
		);
		expect(checkFiles(manifest, found)).toEqual([]);
		expect(manifest.files).toHaveLength(names.length - 1);
		const report = manifest.files.find((f) => f.kind === 'inspection-report')!;
		expect(report.sha256).toBe(sha256Hex(REPORT));
		// The row keeps the manifest byte for byte, its digest and the token.
		const row = (await DataBook.findByPk(book.id))!;
		expect(row.manifest).toBe(text);
		expect(row.manifestDigest).toBe(sha256Hex(text));
		expect(row.token).toBe(book.token);
		expect(manifest.verifyUrl).toBe(dataBookUrl(book.token));
		const events = await AuditEvent.findAll({ where: { action: 'data-book.compiled' } });
		expect(events).toHaveLength(1);
		expect(JSON.parse(events[0]!.after!)).toMatchObject({
			dataBookId: book.id,
			manifestDigest: row.manifestDigest
		});
	});

	it('prints the cover, every joint’s story, and a QR code that opens the verification page', async () => {
		const { book, files } = await compiled();
		const pdf = files.get([...files.keys()][0]!)!;
		const text = squash(await pdfText(pdf));
		for (const s of [
			'Data Book Shop',
			'Invented Rail Co',
			'Bogie frame',
			'D-771',
			'Drawing revision C',
			'Governing code AWS D1.1',
			'W1 · tee · 2F',
			`${wps.number} rev 1 (approved) · digest`,
			'Pass: root',
			'(DB-07)',
			'current on',
			'VT 100 % · accepted',
			'report RT film report.pdf',
			'W2',
			'Not welded yet',
			'1 inspection report (inspection-reports/)'
		])
			expect(text).toContain(s);
		expect(await pdfQr(pdf, 1, 3)).toBe(dataBookUrl(book.token));
	});

	it('verifies by token: matches until the records move, then names what changed', async () => {
		const { book } = await compiled();
		const ok = (await checkDataBook(book.token))!;
		expect(ok).toMatchObject({
			matches: true,
			changed: [],
			manifestIntact: true,
			compiledBy: a.engineer.name
		});
		expect(ok.files.length).toBeGreaterThan(3);
		await svc.logWeld(a.welder, { jointId: joints.W2!, passes: ['root'] });
		const moved = (await checkDataBook(book.token))!;
		expect(moved.matches).toBe(false);
		expect(moved.changed).toEqual(['the weld log (3 then, 4 now)']);
		expect(await checkDataBook('no-such-token-000000000000')).toBeNull();
		expect((await dataBooksOf(a.engineer.shopId, jobId)).length).toBe(3);
	});

	it('checks a copy (the ZIP or its manifest) against the manifest the shop stored', async () => {
		const book = await compileDataBook(a.admin, jobId);
		const zip = await readAll(book.zip());
		const row = (await DataBook.findByPk(book.id))!;
		expect(await checkCopy(zip, row)).toMatchObject({
			kind: 'zip',
			sameManifest: true,
			problems: []
		});
		expect(await checkCopy(Buffer.from(book.manifestText), row)).toMatchObject({
			kind: 'manifest',
			sameManifest: true,
			problems: []
		});
		// The same manifest beside one report with other bytes: named, the rest pass.
		const files = await unzip(zip);
		const report = [...files.keys()].find((n) => n.startsWith('inspection-reports/'))!;
		const entries = [...files]
			.filter(([n]) => n !== MANIFEST_NAME)
			.map(([name, bytes]) => ({ name, bytes: name === report ? Buffer.from('forged') : bytes }));
		const forged = await readAll(zipStream(entries, book.manifestText, new Date()));
		expect(await checkCopy(forged, row)).toMatchObject({
			sameManifest: true,
			problems: [`${report} is not the file the data book was compiled with.`]
		});
		const edited = book.manifestText.replace(book.manifest.compiledBy, 'Someone Else');
		expect((await checkCopy(Buffer.from(edited), row)).sameManifest).toBe(false);
		await expect(checkCopy(Buffer.from('PK\u0003\u0004 not really'), row)).rejects.toThrow(
			CopyRefused
		);
		await expect(checkCopy(Buffer.from('hello'), row)).rejects.toThrow(CopyRefused);
	});
});
