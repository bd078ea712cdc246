import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { OutgoingMail } from '../mail/send';

process.env.DATABASE_FILE = join(mkdtempSync(join(tmpdir(), 'beadline-reminders-')), 'test.sqlite');

const { migrate } = await import('../db');
const { seedDemo } = await import('../seed/seed-demo');
const { LapseNotice, Welder } = await import('../models');
const { runLapseReminders, noticeKind } = await import('./lapse-reminders');
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
