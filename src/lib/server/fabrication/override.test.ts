import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-override-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { AuditEvent, WeldOverride } = await import('../models');
const { ForbiddenError } = await import('../people/errors');
const { addMember } = await import('../people/test-support');
const { addDays, localDay } = await import('../welders/dates');
const P = await import('../procedures/test-support');
const svc = await import('./index');
const T = await import('./test-support');

type People = Awaited<ReturnType<typeof P.shopWithPeople>>;
let a: People;
const joints: Record<string, number> = {};
let lapsed: Awaited<ReturnType<typeof addMember>>;
let lapsedWelderId: number;
let okWelderId: number;

beforeAll(async () => {
	a = await P.shopWithPeople('Override Shop');
	const wps = await T.approvedProcedure(a);
	const draftNumber = (
		await (
			await import('../models')
		).Procedure.findByPk(await P.draftProcedure(a), {
			rejectOnEmpty: true
		})
	).number;
	const { id } = await T.newJob(a);
	await svc.importJoints(
		a.engineer,
		id,
		`mark,type,position,procedure\nW1,tee,2F,${wps.number}\nW2,tee,2F,${draftNumber}\n`
	);
	for (const j of (await svc.jobView(a.engineer, id)).joints) joints[j.mark] = j.id;
	okWelderId = (await T.linkedWelder(a, a.welder)).id;
	lapsed = await addMember(a.shopId, 'welder', 'Lapsed Welder');
	// QW-322.1: six months without the process; a test 400 days ago and no use since.
	lapsedWelderId = (await T.linkedWelder(a, lapsed, { testDate: addDays(localDay(), -400) })).id;
});

const input = (over: Record<string, unknown> = {}) =>
	({
		jointId: joints.W1!,
		welderId: lapsedWelderId,
		reason: 'Requalification coupon passed bend test today; paperwork follows.',
		password: P.PASSWORD,
		...over
	}) as never;

describe('inspector overrides', () => {
	it('a wrong password signs nothing and is audited; the right one signs, and the welder may log', async () => {
		await expect(svc.recordOverride(a.inspector, input({ password: 'wrong' }))).rejects.toThrow(
			/password is not right/
		);
		expect(await WeldOverride.count()).toBe(0);
		expect(await AuditEvent.count({ where: { action: 'job.signature_refused' } })).toBe(1);
		const { id, digest } = await svc.recordOverride(a.inspector, input());
		const o = await WeldOverride.findByPk(id, { rejectOnEmpty: true });
		expect(o).toMatchObject({ printedName: a.inspector.name, role: 'Inspector', digest });
		expect(o.refusal).toMatch(/qualification has lapsed/);
		expect(svc.signatureHolds(o)).toBe(true);
		expect(svc.signatureHolds({ ...o.get({ plain: true }), canonical: '{}' })).toBe(false);
		const logged = await svc.logWeld(lapsed, { jointId: joints.W1!, passes: ['root'] });
		expect(logged.overrideId).toBe(id);
		const view = await svc.jobView(a.engineer, (await svc.findJoint(a.shopId, joints.W1!)).job.id);
		const w1 = view.joints.find((j) => j.mark === 'W1')!;
		expect(w1.history.overrides[0]).toMatchObject({
			welderName: 'Lapsed Welder',
			printedName: a.inspector.name
		});
		expect(w1.history.logs[0]).toMatchObject({ pass: 'root', overrideId: id });
	});

	it('refuses what needs no override, a revision not in force, and anyone but an inspector', async () => {
		await expect(svc.recordOverride(a.inspector, input({ welderId: okWelderId }))).rejects.toThrow(
			/no override is needed/
		);
		await expect(svc.recordOverride(a.inspector, input({ jointId: joints.W2! }))).rejects.toThrow(
			/cannot put a revision in force/
		);
		await expect(svc.recordOverride(a.engineer, input())).rejects.toThrow(ForbiddenError);
	});
});
