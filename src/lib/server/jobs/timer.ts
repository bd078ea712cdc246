// Runs the daily jobs inside the server process. Every hour, not once a day: the notices are
// claimed in the database, so running often costs nothing and a restart near midnight misses
// nothing. With several processes on one database each one ticks, and a lease row
// (jobs/lease.ts) lets one at a time run each job. BEADLINE_JOBS=off leaves it to cron
// (`npm run jobs:reminders`); BEADLINE_JOBS_INTERVAL_MS sets the tick (the first one comes after
// 30 s, or after one interval when that is shorter).
import { sweepCounters } from '../db/window-counters';
import { runLapseReminders } from './lapse-reminders';
import { withLease } from './lease';

const HOURLY_MS = 60 * 60 * 1000;
/** Longer than a run ever takes; a process that dies holding a lease blocks the job this long. */
export const LEASE_MS = 10 * 60 * 1000;

function intervalMs(): number {
	const n = Number(process.env.BEADLINE_JOBS_INTERVAL_MS);
	return Number.isFinite(n) && n >= 100 ? n : HOURLY_MS;
}

/** One tick: each job under its lease. Exported for tests. */
export async function runJobsOnce(now = () => new Date()): Promise<void> {
	const r = await withLease('lapse-reminders', LEASE_MS, () => runLapseReminders(now()));
	if (r && (r.sent.length || r.failed.length))
		console.log(`[jobs] lapse notices: ${r.sent.length} sent, ${r.failed.length} failed`);
	// Counter windows that ended (failed sign-ins, rate limits) are of no use to anyone.
	await withLease('sweep-counters', LEASE_MS, () => sweepCounters());
}

let started = false;
let timers: ReturnType<typeof setTimeout>[] = [];

let running: Promise<void> | null = null;

/**
 * At shutdown: no new run starts, and a run under way gets up to `graceMs` to finish and give
 * its lease back (past that the lease runs out by itself).
 */
export async function stopJobTimers(graceMs = 5_000): Promise<void> {
	for (const t of timers) clearTimeout(t);
	timers = [];
	if (running) await Promise.race([running, new Promise((r) => setTimeout(r, graceMs).unref())]);
}

export function startJobTimers(): void {
	if (started || process.env.BEADLINE_JOBS === 'off') return;
	started = true;
	const every = intervalMs();
	const tick = async () => {
		if (running) return;
		running = runJobsOnce()
			.catch((e) => console.error('[jobs] scheduled jobs failed', e))
			.finally(() => (running = null));
		await running;
	};
	// unref(): the timers never keep a stopping process alive.
	timers = [setTimeout(tick, Math.min(30_000, every)).unref(), setInterval(tick, every).unref()];
}
