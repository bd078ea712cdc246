// Calendar days for continuity. The server's local day is the shop's day: a tap at 8 pm must not
// land on tomorrow, as it would in UTC for a shop west of Greenwich. Run the server in the shop's
// time zone (TZ) when it differs from the machine's.
const pad = (n: number) => String(n).padStart(2, '0');

export function localDay(now: Date = new Date()): string {
	return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** Adds whole days to a 'YYYY-MM-DD' date (calendar arithmetic in UTC, no DST surprises). */
export function addDays(day: string, days: number): string {
	const [y, m, d] = day.split('-').map(Number) as [number, number, number];
	return new Date(Date.UTC(y, m - 1, d + days)).toISOString().slice(0, 10);
}
