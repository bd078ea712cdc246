import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-weld-log-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { AuditEvent, ContinuityEntry, WeldLog } = await import('../models');
const { ForbiddenError, RefusedError } = await import('../people/errors');
const { addMember } = await import('../people/test-support');
const { addDays, localDay } = await import('../welders/dates');
const P = await import('../procedures/test-support');
const svc = await import('./index');
const T = await import('./test-support');

type People = Awaited<ReturnType<typeof P.shopWithPeople>>;
let a: People;
let jobId: number;
const joints: Record<string, number> = {};
const today = localDay();

beforeAll(async () => {
	a = await P.shopWithPeople('Weld Log Shop');
	const wps = await T.approvedProcedure(a);
	const draft = await P.draftProcedure(a);
	const { Procedure } = await import('../models');
	const draftNumber = (await Procedure.findByPk(draft, { rejectOnEmpty: true })).number;
	({ id: jobId } = await T.newJob(a));
	await svc.importJoints(
		a.engineer,
		jobId,
		`mark,type,position,procedure\nW1,tee,2F,${wps.number}\nW2,tee,2F,${draftNumber}\nW3,tee,4F,${wps.number}\n`
	);
	for (const j of (await svc.jobView(a.engineer, jobId)).joints) joints[j.mark] = j.id;
	await T.linkedWelder(a, a.welder);
});

describe('the weld log', () => {
	it('logs the passes a qualified welder finished, once, and counts as continuity', async () => {
		const r = await svc.logWeld(a.welder, { jointId: joints.W1!, passes: ['root', 'fill'] });
		expect(r).toMatchObject({ logged: ['root', 'fill'], already: [], overrideId: null });
		const again = await svc.logWeld(a.welder, { jointId: joints.W1!, passes: ['fill', 'cap'] });
		expect(again).toMatchObject({ logged: ['cap'], already: ['fill'] });
		await expect(svc.logWeld(a.welder, { jointId: joints.W1!, passes: ['root'] })).rejects.toThrow(
			/root pass of W1 is already logged/
		);
		const rows = await WeldLog.findAll({ where: { jointId: joints.W1! } });
		expect(rows.map((x) => x.pass).sort()).toEqual(['cap', 'fill', 'root']);
		expect(rows.every((x) => x.weldedOn === today && x.continuityEntryId !== null)).toBe(true);
		const use = await ContinuityEntry.findByPk(rows[0]!.continuityEntryId!);
		expect(use).toMatchObject({ process: 'GTAW', usedOn: today });
		expect(use?.note).toMatch(/^Weld log: job .*, joint W1$/);
		expect(await AuditEvent.count({ where: { action: 'weld.logged' } })).toBe(2);
		// Logged welds are never edited: the table refuses it.
		// Sequelize wraps the database's error; the trigger's own words are on `parent`.
		const refused = await rows[0]!.update({ weldedOn: '2000-01-01' }).then(
			() => 'accepted',
			(e: { parent?: Error; message: string }) => e.parent?.message ?? e.message
		);
		expect(refused).toMatch(/append-only/);
	});

	it('refuses, in words, a revision not in force', async () => {
		await expect(svc.logWeld(a.welder, { jointId: joints.W2!, passes: ['root'] })).rejects.toThrow(
			/W2 is to be welded to .* rev 1, which is still a draft: it is not in force/
		);
	});

	it('refuses a position the welder does not hold, and a lapsed qualification', async () => {
		// QW-461.9: a 3G plate test qualifies fillet F, H, V, not overhead (4F).
		await expect(svc.logWeld(a.welder, { jointId: joints.W3!, passes: ['root'] })).rejects.toThrow(
			/may not weld W3 .*not qualified for fillet O/
		);
		const lapsedUser = await addMember(a.shopId, 'welder', 'Lapsed Welder');
		// QW-322.1: six months without the process; a test 400 days ago and no use since.
		await T.linkedWelder(a, lapsedUser, { testDate: addDays(today, -400) });
		await expect(svc.logWeld(lapsedUser, { jointId: joints.W1!, passes: ['cap'] })).rejects.toThrow(
			/qualification has lapsed .*An inspector can record an override/
		);
		const gmawUser = await addMember(a.shopId, 'welder', 'GMAW Only');
		await T.linkedWelder(a, gmawUser, { process: 'GMAW', fillerClass: 'ER70S-6' });
		await expect(svc.logWeld(gmawUser, { jointId: joints.W1!, passes: ['cap'] })).rejects.toThrow(
			/GMAW Only may not weld W1 .*no GTAW qualification/
		);
	});

	it('refuses an account without a welder record and any other role', async () => {
		const unlinked = await addMember(a.shopId, 'welder', 'Unlinked');
		await expect(svc.logWeld(unlinked, { jointId: joints.W1!, passes: ['root'] })).rejects.toThrow(
			RefusedError
		);
		await expect(
			svc.logWeld(a.engineer, { jointId: joints.W1!, passes: ['root'] })
		).rejects.toThrow(ForbiddenError);
	});
});
