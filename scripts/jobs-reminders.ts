// npm run jobs:reminders — the lapse warnings once, for cron (the server also runs them hourly).
// --date=YYYY-MM-DD runs them as of another day (tests, or catching up by hand).
import { exitOnConfigError, migrate, sequelize } from '../src/lib/server/db';
import { runLapseReminders } from '../src/lib/server/jobs/lapse-reminders';

const arg = process.argv.find((a) => a.startsWith('--date='));
const now = arg ? new Date(`${arg.slice(7)}T12:00:00`) : new Date();
if (Number.isNaN(now.getTime())) {
	console.error('Give the date as --date=YYYY-MM-DD.');
	process.exit(2);
}

await migrate().catch(exitOnConfigError);
const run = await runLapseReminders(now);
console.log(
	JSON.stringify({
		today: run.today,
		checked: run.checked,
		sent: run.sent.length,
		failed: run.failed.length,
		notices: run.sent
	})
);
await sequelize.close();
if (run.failed.length) {
	for (const f of run.failed) console.error(`qualification ${f.qualificationId}: ${f.error}`);
	process.exit(1);
}
