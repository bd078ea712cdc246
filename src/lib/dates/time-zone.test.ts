import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { dayIn, isTimeZone, timeZoneChoices, zoneOr } from './time-zone';

describe('dayIn', () => {
	it('gives the calendar day of the zone, not of UTC', () => {
		// 2026-12-04 02:00 UTC is 20:00 on 3 December in Chicago (UTC−6 in winter: IANA tz database,
		// America/Chicago, CST) and 13:00 on 4 December in Sydney (UTC+11 in summer, AEDT).
		const at = new Date('2026-12-04T02:00:00Z');
		expect(dayIn(at, 'America/Chicago')).toBe('2026-12-03');
		expect(dayIn(at, 'Australia/Sydney')).toBe('2026-12-04');
		expect(dayIn(at, 'UTC')).toBe('2026-12-04');
	});

	it('follows daylight saving time', () => {
		// US DST 2026 starts Sunday 8 March at 02:00 local (15 U.S.C. 260a: second Sunday in March):
		// 05:30 UTC on 8 March is 23:30 CST on the 7th; 05:30 UTC on 9 March is 00:30 CDT on the 9th.
		expect(dayIn(new Date('2026-03-08T05:30:00Z'), 'America/Chicago')).toBe('2026-03-07');
		expect(dayIn(new Date('2026-03-09T05:30:00Z'), 'America/Chicago')).toBe('2026-03-09');
	});

	it('falls back to UTC for an unknown or missing zone, never the server zone', () => {
		const at = new Date('2026-12-04T02:00:00Z');
		expect(dayIn(at, 'Mars/Olympus_Mons')).toBe('2026-12-04');
		expect(dayIn(at, null)).toBe('2026-12-04');
		expect(zoneOr('')).toBe('UTC');
	});

	it('never throws, and always answers a year-month-day', () => {
		fc.assert(
			fc.property(fc.date({ noInvalidDate: false }), fc.string(), (d, zone) => {
				expect(dayIn(d, zone)).toMatch(/^\d{4,6}-\d{2}-\d{2}$/);
			})
		);
	});
});

describe('isTimeZone', () => {
	it('knows UTC and the runtime IANA zones, refuses made-up names', () => {
		expect(isTimeZone('UTC')).toBe(true);
		expect(isTimeZone('Europe/Oslo')).toBe(true);
		expect(isTimeZone('Nowhere/Town')).toBe(false);
		expect(isTimeZone(42)).toBe(false);
		expect(timeZoneChoices()[0]).toBe('UTC');
		expect(timeZoneChoices().every(isTimeZone)).toBe(true);
	});
});
