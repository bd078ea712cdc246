// Calendar days for continuity. A day is the shop's day: a tap at 8 pm in Chicago must not land
// on tomorrow, as it would in UTC. Callers pass the shop's zone (shops.time_zone, migration
// 0015); with none given it is the machine's, which is also where new shops start.
import { dayIn, machineZone } from '$lib/dates/time-zone';

export function localDay(now: Date = new Date(), timeZone?: string | null): string {
	return dayIn(now, timeZone ?? machineZone());
}

/** Adds whole days to a 'YYYY-MM-DD' date (calendar arithmetic in UTC, no DST surprises). */
export function addDays(day: string, days: number): string {
	const [y, m, d] = day.split('-').map(Number) as [number, number, number];
	return new Date(Date.UTC(y, m - 1, d + days)).toISOString().slice(0, 10);
}
