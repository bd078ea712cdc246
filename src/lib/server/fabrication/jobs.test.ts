import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-jobs-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { AuditEvent, JobJoint } = await import('../models');
const { ForbiddenError, NotFoundError, RefusedError } = await import('../people/errors');
const P = await import('../procedures/test-support');
const svc = await import('./index');
const T = await import('./test-support');

type People = Awaited<ReturnType<typeof P.shopWithPeople>>;
let a: People, b: People;
let wps: { id: number; number: string };

beforeAll(async () => {
	a = await P.shopWithPeople('Job Shop');
	b = await P.shopWithPeople('Other Job Shop');
	wps = await T.approvedProcedure(a);
});

const joint = (over: Record<string, string> = {}) =>
	({
		mark: 'W1',
		jointType: 'butt',
		size: '10 mm',
		baseMetals: 'A36',
		position: '1G',
		procedure: wps.number,
		rev: '',
		...over
	}) as never;

describe('jobs', () => {
	it('an engineer opens a job; numbers are unique in the shop whatever their case', async () => {
		const { id } = await T.newJob(a, { number: 'JOB-CASE-1' });
		await expect(T.newJob(a, { number: 'job-case-1' })).rejects.toThrow(/already a job/);
		await T.newJob(b, { number: 'JOB-CASE-1' }); // another shop may use the same number
		const view = await svc.jobView(a.engineer, id);
		expect(view).toMatchObject({ number: 'JOB-CASE-1', customer: 'Invented Customer Ltd' });
		const e = await AuditEvent.findOne({ where: { action: 'job.created', objectId: String(id) } });
		expect(e?.actorId).toBe(a.engineer.id);
	});

	it('welders and inspectors may not open jobs; another shop sees none', async () => {
		await expect(
			svc.createJob(a.welder, {
				number: 'X',
				customer: 'c',
				part: 'p',
				drawing: '',
				drawingRev: '',
				code: 'shop',
				dueOn: ''
			})
		).rejects.toThrow(ForbiddenError);
		await expect(
			svc.createJob(a.inspector, {
				number: 'X',
				customer: 'c',
				part: 'p',
				drawing: '',
				drawingRev: '',
				code: 'shop',
				dueOn: ''
			})
		).rejects.toThrow(ForbiddenError);
		const { id } = await T.newJob(a);
		await expect(svc.jobView(b.engineer, id)).rejects.toThrow(NotFoundError);
		expect((await svc.listJobs(b.engineer)).some((j) => j.id === id)).toBe(false);
	});
});

describe('joints', () => {
	it('adds one joint to the revision in force, and refuses a mark twice', async () => {
		const { id } = await T.newJob(a);
		await svc.addJoint(a.engineer, id, joint());
		await expect(svc.addJoint(a.engineer, id, joint({ mark: 'w1' }))).rejects.toThrow(
			/already a joint/
		);
		await expect(
			svc.addJoint(a.engineer, id, joint({ mark: 'W2', procedure: 'NOPE-1' }))
		).rejects.toThrow(RefusedError);
		const [j] = (await svc.jobView(a.engineer, id)).joints;
		expect(j).toMatchObject({
			mark: 'W1',
			procedureNumber: wps.number,
			rev: 1,
			revisionState: 'approved'
		});
	});

	it('a pasted list is added whole, or not at all with each row named', async () => {
		const { id } = await T.newJob(a);
		const good = `Mark,Type,Size,Base metals,Position,WPS\nW1,butt,10 mm,"A36, 10 mm",1g,${wps.number}\nW2,tee,6 mm,A36,2F,${wps.number}\n`;
		const bad = `mark,type,position,procedure\nW3,butt,1G,${wps.number}\nW4,spiral,1G,${wps.number}\nW3,butt,9G,${wps.number}\nW5,butt,1G,WPS-NONE\n`;
		let caught: unknown;
		try {
			await svc.importJoints(a.engineer, id, bad);
		} catch (e) {
			caught = e;
		}
		expect(caught).toBeInstanceOf(svc.JointListError);
		const problems = (caught as InstanceType<typeof svc.JointListError>).problems;
		expect(problems.map((p) => p.row)).toEqual([3, 4, 5]);
		expect(problems[2]!.message).toBe('procedure: no procedure WPS-NONE in your shop.');
		expect(problems[0]!.message).toMatch(/^type:/);
		expect(await JobJoint.count({ where: { jobId: id } })).toBe(0);
		// A list whose rows parse but name an unknown procedure is refused whole, too.
		await expect(
			svc.importJoints(
				a.engineer,
				id,
				`mark,type,position,procedure\nW3,butt,1G,${wps.number}\nW5,butt,1G,WPS-NONE\n`
			)
		).rejects.toThrow(svc.JointListError);
		expect(await JobJoint.count({ where: { jobId: id } })).toBe(0);
		const { ids } = await svc.importJoints(a.engineer, id, good);
		expect(ids).toHaveLength(2);
		const view = await svc.jobView(a.engineer, id);
		expect(view.joints.map((j) => [j.mark, j.position, j.baseMetals])).toEqual([
			['W1', '1G', 'A36, 10 mm'],
			['W2', '2F', 'A36']
		]);
	});

	it('names a missing header column and unreadable quoting', async () => {
		expect(svc.parseJointCsv('mark,size\nW1,3').problems[0]!.message).toMatch(
			/missing: type, position, procedure/
		);
		expect(svc.parseJointCsv('mark,type,position,procedure\n"W1,butt').problems).toHaveLength(1);
	});
});
