// Who runs a scheduled job: one row per job in `job_leases`. A process takes the lease with one
// conditional update (free, expired or already its own), runs the job, and gives the lease back.
// So any number of processes may tick; one at a time runs the job. A process that dies holding
// the lease holds it only until `lease_until`. The job's own claims (lapse_notices' unique index)
// still make a second run harmless: the lease saves work, the claims make it right.
import { randomUUID } from 'node:crypto';
import { hostname } from 'node:os';
import { Op } from 'sequelize';
import { write } from '../db';
import { JobLease } from '../models';

/** One conditional update: right under concurrency on its own (db/write-queue.ts, WriteOptions). */
const ATOMIC = { atomicStatements: true };

/** This process, as the lease rows name it. */
export const PROCESS_HOLDER = `${hostname().slice(0, 60)}:${process.pid}:${randomUUID().slice(0, 8)}`;

/** True when `holder` now holds `name` until `now + ms`. */
export function takeLease(
	name: string,
	ms: number,
	now = Date.now(),
	holder = PROCESS_HOLDER
): Promise<boolean> {
	return write(async (t) => {
		await JobLease.bulkCreate([{ name, holder: '', leaseUntil: 0 }], {
			ignoreDuplicates: true,
			transaction: t
		});
		const [taken] = await JobLease.update(
			{ holder, leaseUntil: now + ms },
			{ where: { name, [Op.or]: [{ leaseUntil: { [Op.lt]: now } }, { holder }] }, transaction: t }
		);
		return taken === 1;
	}, ATOMIC);
}

/** Gives the lease back after a run and counts the run; a lease lost meanwhile is left alone. */
export function releaseLease(name: string, holder = PROCESS_HOLDER): Promise<void> {
	return write(async (t) => {
		const where = { name, holder };
		await JobLease.increment('runs', { by: 1, where, transaction: t });
		await JobLease.update({ leaseUntil: 0, lastRunAt: new Date() }, { where, transaction: t });
	}, ATOMIC);
}

/** Runs `job` if this process gets the lease; null when another process holds it. */
export async function withLease<T>(
	name: string,
	ms: number,
	job: () => Promise<T>,
	holder = PROCESS_HOLDER
): Promise<T | null> {
	if (!(await takeLease(name, ms, Date.now(), holder))) return null;
	try {
		return await job();
	} finally {
		await releaseLease(name, holder);
	}
}
