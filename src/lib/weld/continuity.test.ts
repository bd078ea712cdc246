import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addCalendarMonths, continuityStatus, lapseDate, parseDate } from './continuity';

// ASME BPVC IX QW-322.1(a), AWS D1.1 4.2.3.1: six months without using the process.
// Rule chosen: last activity + 6 calendar months, clamped to the end of a shorter month.
describe('lapse date = last use (or test) + 6 calendar months', () => {
	it.each([
		['2025-01-15', '2025-07-15'],
		['2025-08-31', '2026-02-28'], // Aug 31 + 6 months: Feb has 28 days in 2026
		['2023-08-31', '2024-02-29'], // leap year: Feb 29 2024
		['2025-08-29', '2026-02-28'], // Feb 29 does not exist in 2026
		['2023-08-29', '2024-02-29'],
		['2024-02-29', '2024-08-29'], // from a leap day
		['2025-03-31', '2025-09-30'], // Sep has 30 days
		['2025-12-31', '2026-06-30'],
		['2025-07-01', '2026-01-01'], // across the year end
		['2099-09-30', '2100-03-30'], // 2100 is not a leap year (irrelevant here, still fine)
		['2099-08-31', '2100-02-28'] // 2100: not a leap year
	])('%s -> %s', (from, to) => {
		expect(lapseDate(from)).toBe(to);
	});
	it('2000 was a leap year (divisible by 400)', () => {
		expect(lapseDate('1999-08-31')).toBe('2000-02-29');
	});
});

describe('status and days left', () => {
	const status = (uses: string[], today: string, testDate = '2025-01-10') =>
		continuityStatus({ testDate, uses }, today);
	it('current before the lapse date, lapsed on it', () => {
		expect(status([], '2025-07-09')).toMatchObject({
			ok: true,
			status: 'current',
			daysLeft: 1,
			lapsesOn: '2025-07-10'
		});
		expect(status([], '2025-07-10')).toMatchObject({ status: 'lapsed', daysLeft: 0 });
		expect(status([], '2025-08-10')).toMatchObject({ status: 'lapsed', daysLeft: -31 });
	});
	it('the latest logged use restarts the six months', () => {
		expect(status(['2025-03-01', '2025-05-20', '2025-04-02'], '2025-06-01')).toMatchObject({
			status: 'current',
			lastActivity: '2025-05-20',
			lapsesOn: '2025-11-20',
			daysLeft: 172
		});
	});
	it('uses after today and garbage entries are ignored', () => {
		expect(status(['2025-12-01', 'soon', '2025-02-30'], '2025-06-01')).toMatchObject({
			lastActivity: '2025-01-10'
		});
	});
	it('days left across a leap day', () => {
		// last use 2023-08-31 -> lapses 2024-02-29; from 2024-02-01 that is 28 days
		expect(status([], '2024-02-01', '2023-08-31')).toMatchObject({ daysLeft: 28, dueSoon: true });
	});
	it('warns 30 days ahead', () => {
		expect(status([], '2025-06-10')).toMatchObject({ dueSoon: true, daysLeft: 30 });
		expect(status([], '2025-06-09')).toMatchObject({ dueSoon: false, daysLeft: 31 });
	});
	it('bad dates give a message, not a throw', () => {
		expect(continuityStatus({ testDate: '2025-13-01' }, '2025-06-01').ok).toBe(false);
		expect(continuityStatus({ testDate: '2025-01-01' }, 'yesterday').ok).toBe(false);
		expect(parseDate('2023-02-29')).toBeNull();
		expect(parseDate(new Date('nope'))).toBeNull();
		expect(parseDate(new Date(Date.UTC(2024, 1, 29)))).toEqual({ y: 2024, m: 2, d: 29 });
	});
});

describe('properties (fast-check)', () => {
	const day = fc.date({
		min: new Date(Date.UTC(1950, 0, 1)),
		max: new Date(Date.UTC(2200, 0, 1)),
		noInvalidDate: true
	});
	it('the lapse date is within a day or three of six months, and never before the start', () => {
		fc.assert(
			fc.property(day, (d) => {
				const c = parseDate(d);
				if (!c) return;
				const lapse = addCalendarMonths(c, 6);
				const days =
					(Date.UTC(lapse.y, lapse.m - 1, lapse.d) - Date.UTC(c.y, c.m - 1, c.d)) / 86_400_000;
				expect(days).toBeGreaterThanOrEqual(178);
				expect(days).toBeLessThanOrEqual(184);
			})
		);
	});
	it('never throws', () => {
		fc.assert(
			fc.property(fc.anything(), fc.anything(), (a, b) => void continuityStatus(a as never, b))
		);
	});
});
