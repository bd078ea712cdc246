import { Transaction } from 'sequelize';
import { sequelize } from './sequelize';

// SQLite has one writer. Parallel IMMEDIATE transactions in one process would fight over the lock
// and fail with SQLITE_BUSY, so every write transaction of this process waits its turn here.
let tail: Promise<unknown> = Promise.resolve();

/**
 * Runs `work` in one IMMEDIATE transaction after every write queued before it. Pass `{ transaction: t }`
 * to every query inside: a query without it waits on the lock this transaction holds.
 */
export function write<T>(work: (t: Transaction) => Promise<T>): Promise<T> {
	const run = () => sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, (t) => work(t));
	const result = tail.then(run, run);
	tail = result.catch(() => undefined);
	return result;
}
