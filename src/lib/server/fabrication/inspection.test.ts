import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-inspection-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { JointInspection, WeldLog } = await import('../models');
const { ForbiddenError } = await import('../people/errors');
const { jobCounts } = await import('$lib/jobs/status');
const P = await import('../procedures/test-support');
const svc = await import('./index');
const T = await import('./test-support');

type People = Awaited<ReturnType<typeof P.shopWithPeople>>;
let a: People;
let jobId: number;
let wps: { id: number; number: string };
let welderId: number;
const joints: Record<string, number> = {};

beforeAll(async () => {
	a = await P.shopWithPeople('Inspection Shop');
	wps = await T.approvedProcedure(a);
	({ id: jobId } = await T.newJob(a));
	await svc.importJoints(
		a.engineer,
		jobId,
		`mark,type,position,procedure\nW1,tee,2F,${wps.number}\nW2,tee,2F,${wps.number}\n`
	);
	for (const j of (await svc.jobView(a.engineer, jobId)).joints) joints[j.mark] = j.id;
	welderId = (await T.linkedWelder(a, a.welder)).id;
});

const inspect = (over: Record<string, unknown> = {}, who = a.inspector) =>
	svc.recordInspection(who, {
		jointId: joints.W1!,
		method: 'RT',
		extent: '100 %',
		result: 'reject',
		note: '',
		password: P.PASSWORD,
		...over
	} as never);
const history = async (mark: string) =>
	(await svc.jobView(a.engineer, jobId)).joints.find((j) => j.mark === mark)!.history;

describe('inspections and repairs', () => {
	it('inspects only what was welded, and only an inspector who signs', async () => {
		await expect(inspect({ jointId: joints.W2! })).rejects.toThrow(/W2 has no pass logged yet/);
		await svc.logWeld(a.welder, { jointId: joints.W1!, passes: ['root', 'fill', 'cap'] });
		await expect(inspect({ password: 'wrong' })).rejects.toThrow(/password is not right/);
		await expect(inspect({}, a.engineer)).rejects.toThrow(ForbiddenError);
		expect(await JointInspection.count()).toBe(0);
	});

	it('a rejection, its repair under a procedure, the repair welded and accepted: every step kept', async () => {
		await svc.recordInspection(a.inspector, {
			jointId: joints.W1!,
			method: 'VT',
			extent: '100 %',
			result: 'accept',
			note: '',
			password: P.PASSWORD
		});
		expect((await history('W1')).status).toBe('accepted');
		const { digest } = await inspect({ note: 'Porosity at 120 mm.' });
		expect(digest).toMatch(/^[0-9a-f]{64}$/);
		expect((await history('W1')).status).toBe('rejected');
		const repair = {
			jointId: joints.W1!,
			procedure: wps.number,
			rev: '',
			welderId,
			note: 'Grind out and reweld.'
		};
		const { round } = await svc.recordRepair(a.engineer, repair);
		expect(round).toBe(1);
		await expect(svc.recordRepair(a.engineer, repair)).rejects.toThrow(/not rejected/);
		expect((await history('W1')).status).toBe('repaired');
		await expect(inspect()).rejects.toThrow(/Repair 1 of W1 has no pass logged yet/);
		await svc.logWeld(a.welder, { jointId: joints.W1!, passes: ['root'] });
		expect(await WeldLog.count({ where: { jointId: joints.W1!, round: 1 } })).toBe(1);
		await inspect({ result: 'accept' });
		const h = await history('W1');
		expect(h.status).toBe('accepted');
		expect(h.inspections.map((i) => [i.round, i.method, i.result])).toEqual([
			[0, 'VT', 'accept'],
			[0, 'RT', 'reject'],
			[1, 'RT', 'accept']
		]);
		expect(h.repairs[0]).toMatchObject({ round: 1, procedureLabel: `${wps.number} rev 1` });
		for (const i of await JointInspection.findAll()) expect(svc.signatureHolds(i)).toBe(true);
		const all = (await svc.jobView(a.engineer, jobId)).joints.map((j) => j.history);
		expect(jobCounts(all)).toEqual({
			joints: 2,
			welded: 1,
			inspected: 1,
			accepted: 1,
			rejected: 0,
			repaired: 1,
			attention: 0
		});
	});

	it('exports the weld log as CSV, one line a pass, formulas defused', async () => {
		const { weldLogCsv } = await import('./weld-log-csv');
		const job = await svc.jobView(a.engineer, jobId);
		const lines = weldLogCsv(job, new Map()).replace('\uFEFF', '').trim().split('\r\n');
		expect(lines[0]).toBe(
			'job,joint,round,pass,welded on,welder,welder ID,procedure revision,override,joint state now'
		);
		// W1: root, fill, cap first, then the repair's root.
		expect(lines.slice(1).map((l) => l.split(',').slice(1, 4).join(' '))).toEqual([
			'W1 first weld root',
			'W1 first weld fill',
			'W1 first weld cap',
			'W1 repair 1 root'
		]);
		const hostile = { ...job, number: '=HYPERLINK("x")' };
		expect(weldLogCsv(hostile, new Map())).toContain(`"'=HYPERLINK(""x"")"`);
	});
});
