// Runs the daily jobs inside the server process. Every hour, not once a day: the notices are
// claimed in the database, so running often costs nothing and a restart near midnight misses
// nothing. BEADLINE_JOBS=off leaves it to cron (`npm run jobs:reminders`).
import { runLapseReminders } from './lapse-reminders';

const FIRST_RUN_MS = 30_000;
const EVERY_MS = 60 * 60 * 1000;

let started = false;

export function startJobTimers(): void {
	if (started || process.env.BEADLINE_JOBS === 'off') return;
	started = true;
	let busy = false;
	const tick = async () => {
		if (busy) return;
		busy = true;
		try {
			const r = await runLapseReminders(new Date());
			if (r.sent.length || r.failed.length)
				console.log(`[jobs] lapse notices: ${r.sent.length} sent, ${r.failed.length} failed`);
		} catch (e) {
			console.error('[jobs] lapse reminders failed', e);
		} finally {
			busy = false;
		}
	};
	// unref(): the timers never keep a stopping process alive.
	setTimeout(tick, FIRST_RUN_MS).unref();
	setInterval(tick, EVERY_MS).unref();
}
