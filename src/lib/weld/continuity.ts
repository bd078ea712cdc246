// Welder continuity: a qualification lapses six calendar months after the last logged use of
// the process (or the test date if it was never logged).
//
// The rule chosen, since the codes say "six months" and not a number of days:
// - Dates are calendar dates ('YYYY-MM-DD'), no time of day and no time zone.
// - Lapse date = last activity + 6 calendar months. When that month is shorter, the date is
//   clamped to its last day: Aug 31 + 6 months = Feb 28 (Feb 29 in a leap year); Aug 29 also
//   lands on Feb 28 in a common year.
// - The qualification is current up to the day before the lapse date and lapsed from the lapse
//   date on (on that day the six months have passed: QW-322.1(a) "a period of 6 months or more").
// - Days left = whole days from today to the lapse date; 0 or less means lapsed.
import {
	CONTINUITY_MONTHS,
	CONTINUITY_SOURCE,
	CONTINUITY_WARN_DAYS
} from '$reference/qualification-rules';
import { sourceOf, type FindingSource } from './findings';

export interface CalendarDate {
	y: number;
	m: number;
	d: number;
}

const DAY_MS = 86_400_000;

const isLeap = (y: number): boolean => (y % 4 === 0 && y % 100 !== 0) || y % 400 === 0;
export const daysInMonth = (y: number, m: number): number =>
	m === 2 ? (isLeap(y) ? 29 : 28) : [4, 6, 9, 11].includes(m) ? 30 : 31;

/** Reads 'YYYY-MM-DD' (or a Date, by its UTC calendar day). Null for anything not a real date. */
export function parseDate(input: unknown): CalendarDate | null {
	if (input instanceof Date) {
		const t = input.getTime();
		if (!Number.isFinite(t)) return null;
		return { y: input.getUTCFullYear(), m: input.getUTCMonth() + 1, d: input.getUTCDate() };
	}
	if (typeof input !== 'string') return null;
	const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(input.trim());
	if (!m) return null;
	const y = Number(m[1]);
	const mo = Number(m[2]);
	const d = Number(m[3]);
	if (y < 1900 || y > 9999 || mo < 1 || mo > 12 || d < 1 || d > daysInMonth(y, mo)) return null;
	return { y, m: mo, d };
}

const pad = (n: number, w = 2): string => String(n).padStart(w, '0');
const valid = (c: CalendarDate | undefined): c is CalendarDate =>
	typeof c === 'object' &&
	c !== null &&
	[c.y, c.m, c.d].every((n) => Number.isInteger(n)) &&
	c.y >= 0 &&
	c.y <= 9999 &&
	c.m >= 1 &&
	c.m <= 12 &&
	c.d >= 1 &&
	c.d <= 31;

/** 'YYYY-MM-DD'; an empty string for something that is not a calendar date. */
export const formatDate = (c: CalendarDate): string =>
	valid(c) ? `${pad(c.y, 4)}-${pad(c.m)}-${pad(c.d)}` : '';
const dayNumber = (c: CalendarDate): number => Date.UTC(c.y, c.m - 1, c.d) / DAY_MS;

/** Adds calendar months, clamping to the end of a shorter month. */
export function addCalendarMonths(date: CalendarDate, months: number): CalendarDate {
	// Not a date in: not a date out (formatDate prints it as '').
	if (!valid(date) || !Number.isFinite(months) || Math.abs(months) > 120_000)
		return { y: NaN, m: NaN, d: NaN };
	const total = date.y * 12 + (date.m - 1) + Math.trunc(months);
	const y = Math.floor(total / 12);
	const m = (((total % 12) + 12) % 12) + 1;
	return { y, m, d: Math.min(date.d, daysInMonth(y, m)) };
}

/** Whole days from `a` to `b` (negative when b is earlier). */
export const daysBetween = (a: CalendarDate, b: CalendarDate): number =>
	valid(a) && valid(b) ? Math.round(dayNumber(b) - dayNumber(a)) : NaN;

export type ContinuityResult =
	| {
			ok: true;
			status: 'current' | 'lapsed';
			/** The later of the test date and the logged uses. */
			lastActivity: string;
			lapsesOn: string;
			daysLeft: number;
			/** Within the warning window (30 days) and still current. */
			dueSoon: boolean;
			source: FindingSource;
	  }
	| { ok: false; message: string };

/** Lapse date for a last activity date, or null for an unreadable date. */
export function lapseDate(lastActivity: unknown): string | null {
	const c = parseDate(lastActivity);
	return c ? formatDate(addCalendarMonths(c, CONTINUITY_MONTHS)) : null;
}

/**
 * Continuity status on `today` from the test date and the log of uses of the process. Uses later
 * than today are ignored (a log entry cannot count before it happened).
 */
export function continuityStatus(
	input: { testDate: unknown; uses?: unknown },
	today: unknown
): ContinuityResult {
	const now = parseDate(today);
	if (!now) return { ok: false, message: 'Today is not a valid date (YYYY-MM-DD).' };
	const test = parseDate(input?.testDate);
	if (!test) return { ok: false, message: 'The test date is not a valid date (YYYY-MM-DD).' };
	const uses = Array.isArray(input.uses) ? input.uses : [];
	let last = test;
	for (const u of uses.slice(0, 10_000)) {
		const c = parseDate(u);
		if (c && dayNumber(c) <= dayNumber(now) && dayNumber(c) > dayNumber(last)) last = c;
	}
	const lapse = addCalendarMonths(last, CONTINUITY_MONTHS);
	const daysLeft = daysBetween(now, lapse);
	const status = daysLeft > 0 ? 'current' : 'lapsed';
	return {
		ok: true,
		status,
		lastActivity: formatDate(last),
		lapsesOn: formatDate(lapse),
		daysLeft,
		dueSoon: status === 'current' && daysLeft <= CONTINUITY_WARN_DAYS,
		source: sourceOf(CONTINUITY_SOURCE)
	};
}
