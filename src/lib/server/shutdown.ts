// A clean stop on SIGTERM/SIGINT. adapter-node stops taking requests, lets the open ones finish
// and then emits `sveltekit:shutdown`; here the booth look-ups still gathered in memory are
// written and the database connections closed. Without the close, PostgreSQL's connection pool
// keeps the process alive after the server has stopped (SQLite's handle does not).
import { flushLookups } from './booth/lookups';
import { sequelize } from './db';
import { stopJobTimers } from './jobs/timer';

let registered = false;

export function closeOnShutdown(): void {
	if (registered) return;
	registered = true;
	process.once('sveltekit:shutdown', async () => {
		try {
			await stopJobTimers();
			await flushLookups();
		} finally {
			await sequelize.close();
		}
	});
}
