import sqlite3 from 'sqlite3';

export const BUSY_TIMEOUT_MS = 5000;

// Sequelize opens a fresh sqlite3 connection for every transaction and runs no hook on it, so the
// busy timeout has to be set by the driver itself: a Database subclass handed over as dialectModule.
class BusyWaitingDatabase extends sqlite3.Database {
	constructor(filename: string, mode?: number, callback?: (err: Error | null) => void) {
		super(filename, mode ?? sqlite3.OPEN_READWRITE | sqlite3.OPEN_CREATE, callback);
		this.configure('busyTimeout', BUSY_TIMEOUT_MS);
	}
}

export const sqliteDriver = { ...sqlite3, Database: BusyWaitingDatabase };
