import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

// Many writers at once on the places that must give one answer. On SQLite the write queue runs
// them one by one; on PostgreSQL (vitest.postgres.config.ts) they really race, and row locks,
// unique indexes and SERIALIZABLE retries must give the same counts.
const dir = mkdtempSync(join(tmpdir(), 'beadline-contention-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { migrate } = await import('./index');
const { BoothLink, ContinuityEntry, Procedure, ProcedureRevision, SignOff } =
	await import('../models');
const svc = await import('../procedures');
const T = await import('../procedures/test-support');
const { ensureBoothLink } = await import('../booth/links');
const { createWelder } = await import('../welders/welders');
const { recordContinuity } = await import('../welders/continuity');
const { RefusedError } = await import('../people/errors');

type People = Awaited<ReturnType<typeof T.shopWithPeople>>;
let a: People;
const N = 50;
// Each approval checks a password with bcrypt (slow on purpose): fewer of them keep the file quick.
const APPROVALS = 12;

beforeAll(async () => {
	await migrate();
	a = await T.shopWithPeople('Contention Shop');
});

const settle = <X>(n: number, f: (i: number) => Promise<X>) =>
	Promise.allSettled(Array.from({ length: n }, (_, i) => f(i)));

describe('contention', () => {
	it(`${APPROVALS} parallel approvals of one revision: exactly 1 signature and 1 booth link`, async () => {
		const id = await T.procedureInReview(a);
		const results = await settle(APPROVALS, (i) =>
			svc.approveRevision(
				i % 2 ? a.inspector : a.inspector2,
				id,
				1,
				{ password: T.PASSWORD, comment: '' },
				null,
				{ notify: false }
			)
		);
		const rejected = results.filter((r) => r.status === 'rejected') as PromiseRejectedResult[];
		expect(results.length - rejected.length).toBe(1);
		expect(rejected.every((r) => r.reason instanceof svc.AlreadyDecidedError)).toBe(true);
		const rev = await ProcedureRevision.findOne({ where: { procedureId: id, rev: 1 } });
		expect(rev?.state).toBe('approved');
		expect(await SignOff.count({ where: { revisionId: rev!.id } })).toBe(1);
		// Printing its first sheet from many places at once still gives one live link.
		const links = await settle(20, () => ensureBoothLink(a.shopId, rev!.id));
		expect(links.every((l) => l.status === 'fulfilled')).toBe(true);
		expect(await BoothLink.count({ where: { revisionId: rev!.id, revokedAt: null } })).toBe(1);
	});

	it(`${N} parallel taps of one welder: 1 continuity entry, reported created once`, async () => {
		const w = await createWelder(a.admin, {
			name: 'Tapper',
			stamp: 'C-1',
			email: '',
			userId: a.welder.id,
			active: true
		});
		const results = await settle(N, () =>
			recordContinuity({
				shopId: a.shopId,
				userId: a.welder.id,
				process: 'GTAW',
				source: 'booth',
				actor: { id: a.welder.id }
			})
		);
		expect(results.filter((r) => r.status === 'rejected')).toEqual([]);
		const created = results.filter((r) => r.status === 'fulfilled' && r.value.created);
		expect(created).toHaveLength(1);
		expect(await ContinuityEntry.count({ where: { welderId: w.id } })).toBe(1);
	});

	it('20 parallel new procedures with one number in different cases: exactly 1', async () => {
		const results = await settle(20, (i) =>
			svc.createProcedure(a.engineer, {
				number: i % 2 ? 'WPS-RACE-1' : 'wps-race-1',
				title: 'Race',
				code: 'aws-d1.1',
				process: 'GTAW',
				recordIds: []
			})
		);
		const rejected = results.filter((r) => r.status === 'rejected') as PromiseRejectedResult[];
		expect(results.length - rejected.length).toBe(1);
		expect(rejected.every((r) => r.reason instanceof RefusedError)).toBe(true);
		expect(
			await Procedure.count({ where: { shopId: a.shopId, number: ['WPS-RACE-1', 'wps-race-1'] } })
		).toBe(1);
	});
});
