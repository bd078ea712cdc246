// ISO 9606-1:2012 9.2 and 9.3: the six-month confirmation and the three revalidation routes.
// Dates are calendar dates ('YYYY-MM-DD'); months are calendar months as in continuity.ts.
// - 9.2: the employer's welding coordinator (or the examiner) confirms every six months that the
//   welder worked within the range. A gap of more than six months ends the qualification; a
//   later confirmation does not revive it.
// - 9.3 a): retest every 3 years. b): every 2 years, prolonged when two welds made in the last six
//   months before the date were tested (volumetric or destructive) and accepted. c): valid while
//   confirmed, for the same manufacturer with ISO 3834-2 or -3 and documented acceptable welds.
import { ISO_9606_1_VALIDITY } from '$reference/sources';
import { CONTINUITY_WARN_DAYS } from '$reference/qualification-rules';
import {
	addCalendarMonths,
	daysBetween,
	formatDate,
	parseDate,
	type CalendarDate
} from './continuity';
import { sourceOf, type FindingSource } from './findings';

export type RevalidationRoute = 'a' | 'b' | 'c';

export interface IsoValidityInput {
	testDate: unknown;
	/** Dates of the six-monthly confirmations (9.2). */
	confirmations?: unknown;
	route?: unknown;
	/** Route b): dates of production welds tested and accepted. */
	testedWelds?: unknown;
}

export type IsoValidity =
	| {
			ok: true;
			status: 'current' | 'lapsed' | 'expired';
			route: RevalidationRoute;
			/** The next six-monthly confirmation is due by this date. */
			confirmBy: string;
			/** End of the period under the route (a, b); null for c). */
			validUntil: string | null;
			daysLeft: number;
			dueSoon: boolean;
			reason: string;
			source: FindingSource;
	  }
	| { ok: false; message: string };

const day = (c: CalendarDate): number => Date.UTC(c.y, c.m - 1, c.d) / 86_400_000;

const datesOf = (xs: unknown, now: CalendarDate): CalendarDate[] =>
	(Array.isArray(xs) ? xs.slice(0, 10_000) : [])
		.map(parseDate)
		.filter((c): c is CalendarDate => c !== null && day(c) <= day(now))
		.sort((a, b) => day(a) - day(b));

/** Validity on `today` under ISO 9606-1 9.2 and 9.3. Never throws. */
export function isoWelderValidity(input: IsoValidityInput, today: unknown): IsoValidity {
	const now = parseDate(today);
	if (!now) return { ok: false, message: 'Today is not a valid date (YYYY-MM-DD).' };
	const test = parseDate(input?.testDate);
	if (!test) return { ok: false, message: 'The test date is not a valid date (YYYY-MM-DD).' };
	if (day(test) > day(now)) return { ok: false, message: 'The test date is after today.' };
	const route: RevalidationRoute = input.route === 'a' || input.route === 'b' ? input.route : 'c';
	const source = sourceOf(ISO_9606_1_VALIDITY);

	// 9.2: walk the confirmations; the chain breaks at the first gap over six months.
	let last = test;
	let broken: CalendarDate | null = null;
	for (const c of datesOf(input.confirmations, now)) {
		if (day(c) < day(last)) continue;
		const due = addCalendarMonths(last, 6);
		if (day(c) > day(due)) {
			broken = due;
			break;
		}
		last = c;
	}
	const confirmBy = broken ?? addCalendarMonths(last, 6);
	const confirmLapsed = broken !== null || day(now) >= day(confirmBy);

	// 9.3: the end of the period under the route.
	let validUntil: CalendarDate | null = null;
	if (route === 'a') validUntil = addCalendarMonths(test, 36);
	if (route === 'b') {
		validUntil = addCalendarMonths(test, 24);
		const welds = datesOf(input.testedWelds, now);
		// Each 2-year date is passed when two welds of the six months before it were tested.
		for (let i = 0; i < 50 && day(validUntil) <= day(now); i++) {
			const from = day(addCalendarMonths(validUntil, -6));
			const inWindow = welds.filter((w) => day(w) >= from && day(w) <= day(validUntil!));
			if (inWindow.length < 2) break;
			validUntil = addCalendarMonths(validUntil, 24);
		}
	}
	const periodOver = validUntil !== null && day(now) >= day(validUntil);
	const end = validUntil && day(validUntil) < day(confirmBy) ? validUntil : confirmBy;
	const daysLeft = daysBetween(now, end);
	const status = confirmLapsed ? 'lapsed' : periodOver ? 'expired' : 'current';
	const reason =
		status === 'lapsed'
			? `No confirmation within six months (due by ${formatDate(confirmBy)}): the qualification has lapsed (9.2); a new test is needed.`
			: status === 'expired'
				? route === 'a'
					? `Three years from the test passed on ${formatDate(validUntil!)}: retest (9.3 a).`
					: `Two years passed on ${formatDate(validUntil!)} without two tested welds from the six months before: retest or revalidate (9.3 b).`
				: route === 'c'
					? `Current while confirmed every six months (9.3 c): same manufacturer, ISO 3834-2 or -3, acceptable welds documented. Not accepted for PED categories II-IV.`
					: `Current; next confirmation by ${formatDate(confirmBy)}, ${route === 'a' ? 'retest' : 'revalidation'} by ${formatDate(validUntil!)} (9.3 ${route}).`;
	return {
		ok: true,
		status,
		route,
		confirmBy: formatDate(confirmBy),
		validUntil: validUntil ? formatDate(validUntil) : null,
		daysLeft,
		dueSoon: status === 'current' && daysLeft <= CONTINUITY_WARN_DAYS,
		reason,
		source
	};
}
