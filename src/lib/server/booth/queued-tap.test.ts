import { randomUUID } from 'node:crypto';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-queued-tap-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');
process.env.ORIGIN = 'http://booth.test';

const { AuditEvent, ContinuityEntry, ContinuityTap, Welder } = await import('../models');
const procedures = await import('../procedures');
const T = await import('../procedures/test-support');
const booth = await import('./index');
const { localDay, addDays } = await import('../welders/dates');

type People = Awaited<ReturnType<typeof T.shopWithPeople>>;
let a: People;
let welderId: number;
const quiet = { notify: false };
const DAY = 86_400_000;

beforeAll(async () => {
	a = await T.shopWithPeople('Queued Tap Shop');
	const w = await Welder.create({
		shopId: a.shopId,
		name: 'Queue Welder',
		stamp: 'QW-1',
		userId: a.welder.id
	});
	welderId = w.id;
});

/** A procedure of `process` with revision 1 approved; its live booth token. */
async function approvedToken(process: 'GTAW' | 'GMAW' | 'SMAW' | 'FCAW', twice = false) {
	const { id } = await procedures.createProcedure(a.engineer, {
		number: `WPS-${Math.random().toString(36).slice(2, 7)}`,
		title: 'Queued tap',
		code: 'aws-d1.1',
		process,
		recordIds: []
	});
	const sign = async (rev: number) => {
		await procedures.updateDraft(a.engineer, id, rev, T.revisionForm({ process }));
		await procedures.submitRevision(a.engineer, id, rev, null, quiet);
		await procedures.approveRevision(
			a.inspector,
			id,
			rev,
			{ password: T.PASSWORD, comment: '' },
			null,
			quiet
		);
	};
	await sign(1);
	if (twice) {
		await procedures.startRevision(a.engineer, id);
		await sign(2);
	}
	const links = await booth.linksOfProcedure(a.admin, id);
	return (
		links.revisions
			.find((r) => r.rev === 1)
			?.live?.path?.split('/')
			.pop() ?? ''
	);
}

describe('a queued tap', () => {
	it('logs the day it was made, with made and arrived times in the trail', async () => {
		const token = await approvedToken('SMAW');
		const id = randomUUID();
		const madeAt = new Date(Date.now() - DAY);
		const r = await booth.receiveTap(a.welder, token, { id, madeAt }, null);
		expect(r).toMatchObject({ outcome: 'logged', repeat: false, usedOn: localDay(madeAt) });
		expect(r.usedOn).toBe(addDays(localDay(), -1));
		const row = await ContinuityTap.findOne({ where: { clientId: id }, rejectOnEmpty: true });
		expect(row.madeAt.getTime()).toBe(madeAt.getTime());
		expect(row.receivedAt.getTime()).toBeGreaterThanOrEqual(madeAt.getTime());
		const events = await AuditEvent.findAll({
			where: { action: 'continuity.recorded', shopId: a.shopId }
		});
		const trail = events.map((e) => JSON.parse(e.after ?? '{}')).find((x) => x.tap?.id === id);
		expect(trail.tap.madeAt).toBe(madeAt.toISOString());
		expect(trail.tap.receivedAt >= trail.tap.madeAt).toBe(true);
	});

	it('counts once when the same id arrives twice at once', async () => {
		const token = await approvedToken('FCAW');
		const id = randomUUID();
		const tap = () => booth.receiveTap(a.welder, token, { id, madeAt: new Date() }, null);
		const answers = await Promise.all([tap(), tap(), tap()]);
		expect(answers.filter((x) => x.outcome === 'logged' && !x.repeat)).toHaveLength(1);
		expect(answers.filter((x) => x.repeat)).toHaveLength(2);
		expect(await ContinuityTap.count({ where: { clientId: id } })).toBe(1);
		expect(
			await ContinuityEntry.count({ where: { welderId, process: 'FCAW', usedOn: localDay() } })
		).toBe(1);
	});

	it('is refused with its reason on a revision no longer in force, and the retry gets the same', async () => {
		const token = await approvedToken('GTAW', true);
		const id = randomUUID();
		const first = await booth.receiveTap(a.welder, token, { id, madeAt: new Date() }, null);
		expect(first).toMatchObject({ outcome: 'refused', repeat: false });
		expect(first.message).toMatch(/not the one in force/);
		const again = await booth.receiveTap(a.welder, token, { id, madeAt: new Date() }, null);
		expect(again).toMatchObject({ outcome: 'refused', repeat: true, message: first.message });
		expect(
			await AuditEvent.count({ where: { action: 'continuity.refused', shopId: a.shopId } })
		).toBe(1);
	});

	it('is refused when unknown or older than the limit; a time ahead of the server is taken as now', async () => {
		const unknown = await booth.receiveTap(
			a.welder,
			'x'.repeat(24),
			{ id: randomUUID(), madeAt: new Date() },
			null
		);
		expect(unknown.outcome).toBe('refused');
		const token = await approvedToken('GMAW');
		const old = new Date(Date.now() - (booth.MAX_TAP_AGE_DAYS + 1) * DAY);
		const late = await booth.receiveTap(a.welder, token, { id: randomUUID(), madeAt: old }, null);
		expect(late).toMatchObject({ outcome: 'refused' });
		expect(late.message).toMatch(/more than 30 days ago/);
		const id = randomUUID();
		const ahead = await booth.receiveTap(
			a.welder,
			token,
			{ id, madeAt: new Date(Date.now() + 3 * DAY) },
			null
		);
		expect(ahead).toMatchObject({ outcome: 'logged', usedOn: localDay() });
	});
});
