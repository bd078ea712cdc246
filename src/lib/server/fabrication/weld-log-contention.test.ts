import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

// Many logs of one pass at once (a double tap, a retried request, two phones): the unique
// constraint on joint, round and pass must keep exactly one. On SQLite the write queue runs them
// one by one; on PostgreSQL (vitest.postgres.config.ts) they really race.
const dir = mkdtempSync(join(tmpdir(), 'beadline-weld-contention-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { AuditEvent, ContinuityEntry, WeldLog } = await import('../models');
const { RefusedError } = await import('../people/errors');
const P = await import('../procedures/test-support');
const svc = await import('./index');
const T = await import('./test-support');

const N = 50;
type People = Awaited<ReturnType<typeof P.shopWithPeople>>;
let a: People;
let jointId: number;

beforeAll(async () => {
	a = await P.shopWithPeople('Weld Contention Shop');
	const wps = await T.approvedProcedure(a);
	const { id } = await T.newJob(a);
	({ id: jointId } = await svc.addJoint(a.engineer, id, {
		mark: 'W1',
		jointType: 'tee',
		size: '',
		baseMetals: '',
		position: '2F',
		procedure: wps.number,
		rev: ''
	}));
	await T.linkedWelder(a, a.welder);
});

describe('parallel weld logs', () => {
	it(`${N} parallel logs of one pass: 1 row, 1 success, the rest told it is logged`, async () => {
		const results = await Promise.allSettled(
			Array.from({ length: N }, () => svc.logWeld(a.welder, { jointId, passes: ['root'] }))
		);
		const ok = results.filter((r) => r.status === 'fulfilled');
		const refused = results.filter((r): r is PromiseRejectedResult => r.status === 'rejected');
		expect(ok).toHaveLength(1);
		expect(refused).toHaveLength(N - 1);
		for (const r of refused) {
			expect(r.reason).toBeInstanceOf(RefusedError);
			expect((r.reason as Error).message).toMatch(/already logged/);
		}
		expect(await WeldLog.count({ where: { jointId } })).toBe(1);
		expect(await ContinuityEntry.count({ where: { shopId: a.shopId } })).toBe(1);
		expect(
			await AuditEvent.count({ where: { action: 'weld.logged', objectId: String(jointId) } })
		).toBe(1);
	}, 120_000);
});
