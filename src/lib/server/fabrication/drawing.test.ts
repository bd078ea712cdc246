import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-drawing-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { AuditEvent, JointInspection } = await import('../models');
const { ForbiddenError, NotFoundError, RefusedError } = await import('../people/errors');
const { markerSchema } = await import('$lib/schemas/job');
const P = await import('../procedures/test-support');
const svc = await import('./index');
const T = await import('./test-support');

type People = Awaited<ReturnType<typeof P.shopWithPeople>>;
let a: People;
let jobId: number;
let otherJob: number;
const joints: Record<string, number> = {};
const PDF = new TextEncoder().encode('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n');

beforeAll(async () => {
	a = await P.shopWithPeople('Drawing Shop');
	const wps = await T.approvedProcedure(a);
	({ id: jobId } = await T.newJob(a));
	({ id: otherJob } = await T.newJob(a));
	await svc.importJoints(
		a.engineer,
		jobId,
		`mark,type,position,procedure\nW1,tee,2F,${wps.number}\nW2,tee,2F,${wps.number}\n`
	);
	for (const j of (await svc.jobView(a.engineer, jobId)).joints) joints[j.mark] = j.id;
	await T.linkedWelder(a, a.welder);
});

describe('the drawing and its markers', () => {
	it('refuses what is not a PDF or image, stores an image re-encoded with its size', async () => {
		await expect(
			svc.attachDrawing(a.engineer, jobId, { bytes: new Uint8Array([1, 2, 3]), name: 'x.png' })
		).rejects.toThrow(/is not a PDF or JPEG or PNG file/);
		await expect(svc.attachDrawing(a.welder, jobId, { bytes: PDF, name: 'd.pdf' })).rejects.toThrow(
			ForbiddenError
		);
		const png = await sharp({
			create: { width: 300, height: 100, channels: 3, background: '#fff' }
		})
			.png()
			.toBuffer();
		await svc.attachDrawing(a.engineer, jobId, { bytes: png, name: 'frame.png' });
		const view = await svc.jobView(a.engineer, jobId);
		expect(view.drawingFile).toEqual({ name: 'frame.png', kind: 'image', width: 300, height: 100 });
		const served = await svc.openDrawing(a.welder, jobId);
		expect((await sharp(served.bytes).metadata()).width).toBe(300);
	});

	it('places markers as fractions, refuses out-of-range values and another job’s joint', async () => {
		// common practice, no source: positions are fractions 0–1 of the drawing's width and height
		expect(markerSchema.safeParse({ jointId: 1, x: '1.5', y: '0.2' }).success).toBe(false);
		expect(markerSchema.safeParse({ jointId: 1, x: '0.5', y: '' }).success).toBe(false);
		expect(markerSchema.parse({ jointId: 1, x: '0,25', y: '0.123456' })).toEqual({
			jointId: 1,
			x: 0.25,
			y: 0.1235
		});
		await svc.placeMarker(a.engineer, jobId, { jointId: joints.W1!, x: 0.25, y: 0.5 });
		const w1 = (await svc.jobView(a.engineer, jobId)).joints.find((j) => j.mark === 'W1')!;
		expect(w1.marker).toEqual({ x: 0.25, y: 0.5 });
		await expect(
			svc.placeMarker(a.engineer, otherJob, { jointId: joints.W1!, x: 0.1, y: 0.1 })
		).rejects.toThrow(RefusedError);
		await svc.placeMarker(a.engineer, jobId, { jointId: joints.W1!, x: null, y: null });
		expect(
			(await svc.jobView(a.engineer, jobId)).joints.find((j) => j.mark === 'W1')!.marker
		).toBeNull();
		expect(await AuditEvent.count({ where: { action: 'joint.marker_placed' } })).toBe(2);
	});
});

describe('inspection reports', () => {
	it('keeps the report with the signed inspection and serves it only through its job', async () => {
		await svc.logWeld(a.welder, { jointId: joints.W2!, passes: ['root', 'fill', 'cap'] });
		const bad = svc.recordInspection(a.inspector, {
			jointId: joints.W2!,
			method: 'RT',
			extent: '100 %',
			result: 'accept',
			note: '',
			password: P.PASSWORD,
			report: { bytes: new TextEncoder().encode('<script>'), name: 'r.pdf' }
		});
		await expect(bad).rejects.toThrow(/is not a PDF or JPEG or PNG file/);
		expect(await JointInspection.count()).toBe(0);
		const { id } = await svc.recordInspection(a.inspector, {
			jointId: joints.W2!,
			method: 'RT',
			extent: '100 %',
			result: 'accept',
			note: '',
			password: P.PASSWORD,
			report: { bytes: PDF, name: 'W2 film.pdf' }
		});
		const i = await JointInspection.findByPk(id, { rejectOnEmpty: true });
		expect(JSON.parse(i.canonical).report.name).toBe('W2 film.pdf');
		expect(svc.signatureHolds(i)).toBe(true);
		const got = await svc.openInspectionReport(a.engineer, jobId, id);
		expect(Buffer.from(got.bytes).equals(Buffer.from(PDF))).toBe(true);
		await expect(svc.openInspectionReport(a.engineer, otherJob, id)).rejects.toThrow(NotFoundError);
		const view = await svc.jobView(a.engineer, jobId);
		expect(view.joints.find((j) => j.mark === 'W2')!.history.inspections[0]!.report).toEqual({
			name: 'W2 film.pdf'
		});
	});
});
