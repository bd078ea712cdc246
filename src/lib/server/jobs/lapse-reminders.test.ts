import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { OutgoingMail } from '../mail/send';

process.env.DATABASE_FILE = join(mkdtempSync(join(tmpdir(), 'beadline-reminders-')), 'test.sqlite');

const { migrate } = await import('../db');
const { seedDemo } = await import('../seed/seed-demo');
const { JobLease, LapseNotice, Welder } = await import('../models');
const { runLapseReminders, noticeKind, STALE_CLAIM_MS } = await import('./lapse-reminders');
const { releaseLease, takeLease, withLease } = await import('./lease');
const { addDays, localDay } = await import('../welders/dates');

beforeAll(async () => {
	await migrate();
	await seedDemo();
	await seedDemo(); // idempotent: a second seed adds nothing
});

const collect = () => {
	const mails: OutgoingMail[] = [];
	return { mails, send: async (m: OutgoingMail) => void mails.push(m) };
};
const noon = (day: string) => new Date(`${day}T12:00:00`);

describe('which notice a day gets', () => {
	it.each([
		[31, null],
		[30, '30-day'], // 30 days before (the brief)
		[8, '30-day'],
		[7, '7-day'], // 7 days before (the brief)
		[1, '7-day'],
		[0, 'day'], // on the day (the brief)
		[-2, 'day'], // a missed run catches up for a few days (product choice)
		[-3, null]
	])('%i days left: %s', (days, kind) => {
		expect(noticeKind(days)).toBe(kind);
	});
});

describe('the daily lapse reminder job', () => {
	it('sends one 7-day notice for the demo welder lapsing within a week, and none again', async () => {
		expect(await Welder.count()).toBe(4);
		const today = localDay();
		const first = collect();
		const run = await runLapseReminders(noon(today), first.send);
		expect(run.failed).toEqual([]);
		expect(run.sent).toHaveLength(1);
		expect(run.sent[0]).toMatchObject({ kind: '7-day' });
		const toPriya = first.mails.filter((m) => m.to === 'priya@larkspur.example');
		expect(toPriya).toHaveLength(1);
		expect(toPriya[0]!.subject).toMatch(/^7-day notice: Priya Venn's GMAW qualification/);
		expect(first.mails.some((m) => m.to === 'dana@larkspur.example')).toBe(true);

		const second = collect();
		expect((await runLapseReminders(noon(today), second.send)).sent).toHaveLength(0);
		expect(second.mails).toHaveLength(0);
		expect(await LapseNotice.count({ where: { kind: '7-day' } })).toBe(1);
	});

	it('on the lapse day the day notice goes out once; a mail failure releases the claim', async () => {
		const lapse = (await LapseNotice.findOne({ where: { kind: '7-day' } }))!.lapsesOn;
		const failing = async () => {
			throw new Error('SMTP down');
		};
		const broken = await runLapseReminders(noon(lapse), failing);
		expect(broken.failed).toHaveLength(1);
		expect(await LapseNotice.count({ where: { kind: 'day' } })).toBe(0);
		const retry = collect();
		expect((await runLapseReminders(noon(lapse), retry.send)).sent).toMatchObject([
			{ kind: 'day', lapsesOn: lapse }
		]);
		expect(retry.mails.find((m) => m.to === 'priya@larkspur.example')?.subject).toMatch(/^Lapsed:/);
		expect((await runLapseReminders(noon(addDays(lapse, 1)), collect().send)).sent).toHaveLength(0);
	});
});

describe('the lapse reminder job across processes', () => {
	it('sends each due notice once when three runs race, and again after a claim went stale', async () => {
		await LapseNotice.destroy({ where: {} });
		const today = localDay();
		const runs = [collect(), collect(), collect()];
		const results = await Promise.all(runs.map((r) => runLapseReminders(noon(today), r.send)));
		expect(results.flatMap((r) => r.failed)).toEqual([]);
		expect(results.flatMap((r) => r.sent)).toHaveLength(1);
		const mails = runs.flatMap((r) => r.mails);
		expect(mails.filter((m) => m.to === 'priya@larkspur.example')).toHaveLength(1);

		// A process died after claiming: the claim stays unsent. Fresh, it is left alone…
		const notice = (await LapseNotice.findOne({ where: { kind: '7-day' } }))!;
		await LapseNotice.update({ sentAt: null }, { where: { id: notice.id } });
		expect((await runLapseReminders(noon(today), collect().send)).sent).toHaveLength(0);
		// …and once older than STALE_CLAIM_MS it is released and the notice goes out.
		const old = new Date(Date.now() - STALE_CLAIM_MS - 60_000);
		await LapseNotice.sequelize!.query('UPDATE lapse_notices SET updated_at = ? WHERE id = ?', {
			replacements: [old.toISOString().replace('T', ' ').replace('Z', ' +00:00'), notice.id]
		});
		const retry = collect();
		expect((await runLapseReminders(noon(today), retry.send)).sent).toHaveLength(1);
		expect(retry.mails.filter((m) => m.to === 'priya@larkspur.example')).toHaveLength(1);
	});
});

describe('the job lease', () => {
	it('lets one holder in at a time, hands over when given back or expired', async () => {
		const [t, ms] = [Date.now(), 60_000];
		const taken = await Promise.all(['p1', 'p2', 'p3'].map((h) => takeLease('test-job', ms, t, h)));
		expect(taken.filter(Boolean)).toHaveLength(1);
		const winner = ['p1', 'p2', 'p3'][taken.indexOf(true)]!;
		const other = winner === 'p1' ? 'p2' : 'p1';
		expect(await takeLease('test-job', ms, t + 1, other)).toBe(false);
		// The holder may renew; a dead holder's lease runs out.
		expect(await takeLease('test-job', ms, t + 1, winner)).toBe(true);
		expect(await takeLease('test-job', ms, t + ms + 2, other)).toBe(true);
		await releaseLease('test-job', other);
		expect(await takeLease('test-job', ms, t + ms + 3, winner)).toBe(true);
		await releaseLease('test-job', winner);
		expect(await JobLease.findByPk('test-job')).toMatchObject({ runs: 2, leaseUntil: 0 });
	});

	it('runs a job in one racing process at a time; the others skip it meanwhile', async () => {
		let [running, most, ran] = [0, 0, 0];
		const job = async () => {
			most = Math.max(most, ++running);
			await new Promise((r) => setImmediate(r));
			running--;
			return ++ran;
		};
		const r = await Promise.all(
			['q1', 'q2', 'q3', 'q4', 'q5'].map((h) => withLease('once', 60_000, job, h))
		);
		expect(most).toBe(1);
		expect(ran).toBeGreaterThanOrEqual(1);
		// A process skipped the job exactly when it found the lease taken.
		expect(r.filter((x) => x === null)).toHaveLength(5 - ran);
	});
});
