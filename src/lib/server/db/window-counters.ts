// Counters over a time window, kept in the database so every process sees the same count: failed
// sign-ins per e-mail and the rate limiters' hits. A window opens at the first hit and lasts
// `windowMs`; a hit after its end opens a new one.
//
// Each step is a statement every dialect runs atomically, inside one `write()`: drop the key's
// expired window, insert the key if it is missing (INSERT OR IGNORE on SQLite, ON CONFLICT DO
// NOTHING on PostgreSQL, both through Sequelize's `ignoreDuplicates`), add one with
// `hits = hits + 1`. Two processes hitting one key at once both count: the second insert is
// ignored, and the increments queue on the row (READ COMMITTED on PostgreSQL: see ATOMIC).
import { Op, type Transaction } from 'sequelize';
import { WindowCounter } from '../models';
import { write } from './write-queue';

/** Every step below is right on its own under concurrency (write-queue.ts, WriteOptions). */
const ATOMIC = { atomicStatements: true };

/** Counts one hit on `key` and answers the hits in its window so far, this one included. */
export function hit(key: string, windowMs: number, now = Date.now()): Promise<number> {
	return write(async (t: Transaction) => {
		await WindowCounter.destroy({ where: { key, windowEnd: { [Op.lt]: now } }, transaction: t });
		await WindowCounter.bulkCreate([{ key, hits: 0, windowEnd: now + windowMs }], {
			ignoreDuplicates: true,
			transaction: t
		});
		await WindowCounter.increment('hits', { by: 1, where: { key }, transaction: t });
		const row = await WindowCounter.findByPk(key, { transaction: t });
		return row?.hits ?? 1;
	}, ATOMIC);
}

/** The hits on `key` in a window that is still open at `now`; 0 when there is none. */
export async function hits(key: string, now = Date.now()): Promise<number> {
	const row = await WindowCounter.findByPk(key);
	return row && row.windowEnd >= now ? row.hits : 0;
}

/**
 * Forgets `key`, or every key starting with `prefix` (`{ prefix: true }`). Most keys have no row
 * (a member with no failed sign-in): a read first spares them the write lock.
 */
export async function reset(key: string, opts: { prefix?: boolean } = {}): Promise<number> {
	if (!opts.prefix && !(await WindowCounter.findByPk(key))) return 0;
	const where = opts.prefix ? { key: { [Op.startsWith]: key } } : { key };
	return write((t) => WindowCounter.destroy({ where, transaction: t }), ATOMIC);
}

/** Removes windows that ended before `now`, so keys sprayed once do not pile up. */
export function sweepCounters(now = Date.now()): Promise<number> {
	return write(
		(t) => WindowCounter.destroy({ where: { windowEnd: { [Op.lt]: now } }, transaction: t }),
		ATOMIC
	);
}
