// A joint's state from its history, and a job's counts: computed each time, never stored.
// Pure (no framework): the job page, the list, the API and the data book share it.
import type { JointHistory, JointStatus } from './types';

type History = Pick<JointHistory, 'round' | 'logs' | 'inspections'>;

/** The latest inspection of the current round decides; a repair not yet inspected is 'repaired'. */
export function jointStatus(h: History): JointStatus {
	const latest = h.inspections.filter((i) => i.round === h.round).at(-1);
	if (latest) return latest.result === 'accept' ? 'accepted' : 'rejected';
	if (h.round > 0) return 'repaired';
	return h.logs.some((l) => l.round === 0) ? 'welded' : 'open';
}

export interface JobCounts {
	joints: number;
	welded: number;
	inspected: number;
	accepted: number;
	rejected: number;
	repaired: number;
	/** Rejected and waiting for a repair, or welded and waiting for inspection. */
	attention: number;
}

export function jobCounts(histories: readonly History[]): JobCounts {
	const c: JobCounts = {
		joints: histories.length,
		welded: 0,
		inspected: 0,
		accepted: 0,
		rejected: 0,
		repaired: 0,
		attention: 0
	};
	for (const h of histories) {
		const s = jointStatus(h);
		if (h.logs.length) c.welded++;
		if (h.inspections.length) c.inspected++;
		if (s === 'accepted') c.accepted++;
		if (s === 'rejected') c.rejected++;
		if (h.round > 0) c.repaired++;
		if (s === 'rejected' || s === 'welded' || s === 'repaired') c.attention++;
	}
	return c;
}

export const STATUS_WORDS: Record<JointStatus, string> = {
	open: 'Not welded',
	welded: 'Welded, to inspect',
	accepted: 'Accepted',
	rejected: 'Rejected: repair',
	repaired: 'Repaired, to inspect'
};
