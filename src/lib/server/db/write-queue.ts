import { setTimeout as sleep } from 'node:timers/promises';
import { Transaction } from 'sequelize';
import { isPostgres, isRetryableConflict } from './dialect';
import { sequelize } from './sequelize';

// SQLite has one writer. Parallel IMMEDIATE transactions in one process would fight over the lock
// and fail with SQLITE_BUSY, so every write transaction of this process waits its turn here.
let tail: Promise<unknown> = Promise.resolve();

/** Attempts per write on PostgreSQL before a conflict is given up on (and surfaces as a 5xx). */
export const MAX_ATTEMPTS = 12;

/**
 * Runs `work` in one write transaction and resolves with what it returns. Pass
 * `{ transaction: t }` to every query inside.
 *
 * SQLite: one IMMEDIATE transaction after every write of this process queued before it; a
 * query without `t` waits on the lock this transaction holds.
 *
 * PostgreSQL: no queue (the writers may be in other processes). Each transaction is SERIALIZABLE:
 * every service was written for SQLite's one-writer world (read, check, then write), and
 * SERIALIZABLE is the level at which that pattern stays correct without each service
 * re-proving it; the database aborts whichever transaction would break it (40001), as it does
 * a deadlock (40P01), and the whole of `work` runs again on a fresh snapshot. The hot spots
 * also take row locks (`lock: t.LOCK.UPDATE`), so contenders queue instead of aborting over
 * and over. `work` may therefore run more than once: it must do nothing outside the database
 * (mail, files, timers): do those after write() resolves.
 */
export function write<T>(
	work: (t: Transaction) => Promise<T>,
	opts: WriteOptions = {}
): Promise<T> {
	if (isPostgres(sequelize)) return retrying(work, opts);
	const run = () => sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, (t) => work(t));
	const result = tail.then(run, run);
	tail = result.catch(() => undefined);
	return result;
}

export interface WriteOptions {
	/**
	 * `work` is only statements that are each right on their own under concurrency: conditional
	 * updates, `col = col + n`, inserts that ignore a duplicate (the shared counters, booth
	 * look-ups and job leases). PostgreSQL then runs it READ COMMITTED, where contenders for one
	 * row wait for its lock and go on, instead of SERIALIZABLE, where 40 racing increments of one
	 * counter would abort each other until the retries ran out. No effect on SQLite.
	 */
	atomicStatements?: boolean;
}

async function retrying<T>(work: (t: Transaction) => Promise<T>, opts: WriteOptions): Promise<T> {
	const L = Transaction.ISOLATION_LEVELS;
	const isolationLevel = opts.atomicStatements ? L.READ_COMMITTED : L.SERIALIZABLE;
	for (let attempt = 1; ; attempt++) {
		try {
			return await sequelize.transaction({ isolationLevel }, (t) => work(t));
		} catch (e) {
			if (!isRetryableConflict(e) || attempt >= MAX_ATTEMPTS) throw e;
			// Back off with jitter so the same contenders do not collide again in step.
			await sleep(Math.random() * Math.min(200, 5 * 2 ** attempt));
		}
	}
}
