// A job's page posts joint ids; a hand-edited id of another job's joint (same shop) must be
// refused, not written to that other job (the bug: only the shop was checked).
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-job-scope-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { JointInspection, JointRepair, WeldLog, WeldOverride } = await import('../models');
const { RefusedError } = await import('../people/errors');
const P = await import('../procedures/test-support');
const svc = await import('./index');
const T = await import('./test-support');

type People = Awaited<ReturnType<typeof P.shopWithPeople>>;
let a: People;
let jobA: number;
let jobB: number;
let jointB: number;
let welderId: number;

beforeAll(async () => {
	a = await P.shopWithPeople('Scope Shop');
	const wps = await T.approvedProcedure(a);
	({ id: jobA } = await T.newJob(a));
	({ id: jobB } = await T.newJob(a));
	await svc.importJoints(
		a.engineer,
		jobA,
		`mark,type,position,procedure\nW1,tee,2F,${wps.number}\n`
	);
	await svc.importJoints(
		a.engineer,
		jobB,
		`mark,type,position,procedure\nW1,tee,2F,${wps.number}\n`
	);
	jointB = (await svc.jobView(a.engineer, jobB)).joints[0]!.id;
	welderId = (await T.linkedWelder(a, a.welder)).id;
});

const refusedAtJoint = async (p: Promise<unknown>) => {
	const e = await p.then(
		() => null,
		(x: unknown) => x
	);
	expect(e).toBeInstanceOf(RefusedError);
	expect((e as InstanceType<typeof RefusedError>).field).toBe('jointId');
	expect((e as Error).message).toMatch(/not on this job/);
};

describe('joint of another job', () => {
	it('a weld log, override, inspection and repair posted on job A for a joint of job B are refused', async () => {
		await refusedAtJoint(svc.logWeld(a.welder, { jointId: jointB, passes: ['root'], jobId: jobA }));
		await refusedAtJoint(
			svc.recordOverride(a.inspector, {
				jointId: jointB,
				welderId,
				reason: 'Hand-edited id',
				password: P.PASSWORD,
				jobId: jobA
			})
		);
		await refusedAtJoint(
			svc.recordInspection(a.inspector, {
				jointId: jointB,
				method: 'VT',
				extent: '100 %',
				result: 'reject',
				note: '',
				password: P.PASSWORD,
				jobId: jobA
			})
		);
		await refusedAtJoint(
			svc.recordRepair(a.engineer, {
				jointId: jointB,
				procedure: 'X',
				rev: '',
				welderId,
				note: '',
				jobId: jobA
			})
		);
		expect(await WeldLog.count()).toBe(0);
		expect(await WeldOverride.count()).toBe(0);
		expect(await JointInspection.count()).toBe(0);
		expect(await JointRepair.count()).toBe(0);
	});

	it('the same joint on its own job is taken', async () => {
		const r = await svc.logWeld(a.welder, { jointId: jointB, passes: ['root'], jobId: jobB });
		expect(r.logged).toEqual(['root']);
	});
});
