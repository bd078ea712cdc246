// Status of one qualification, computed each time from its test date and the log: never stored.
import { continuityStatus, type ContinuityResult } from '$lib/weld/continuity';
import type { FindingSource } from '$lib/weld/findings';

export type QualificationState = 'current' | 'lapsed' | 'withdrawn';

export interface QualificationStatus {
	state: QualificationState;
	/** The later of the test date and the activity that counts (see `basis`). */
	lastActivity: string;
	lapsesOn: string;
	/** Days from today to the lapse date; 0 or less once lapsed. */
	daysLeft: number;
	/** Current with 30 days or fewer left. */
	dueSoon: boolean;
	/** What restarts the six months: a logged use, or (ISO 9606-1) a confirmation. */
	basis: 'use' | 'confirmation';
	source: FindingSource;
}

export interface StatusInput {
	code: string;
	testDate: string;
	withdrawnAt?: Date | null;
	/** Dates the welder used this qualification's process. */
	uses: readonly string[];
	/** ISO 9606-1 confirmations of this qualification. */
	confirmations: readonly string[];
}

/**
 * ASME IX QW-322.1 and AWS D1.1: six months without using the process. ISO 9606-1 counts the
 * six months from the employer's confirmation instead; the uses are the evidence for it.
 */
export function qualificationStatus(q: StatusInput, today: string): QualificationStatus {
	const basis = q.code === 'ISO 9606-1' ? 'confirmation' : 'use';
	const r: ContinuityResult = continuityStatus(
		{ testDate: q.testDate, uses: basis === 'use' ? q.uses : q.confirmations },
		today
	);
	if (!r.ok) throw new Error(`Stored qualification has a bad date: ${r.message}`);
	return {
		state: q.withdrawnAt ? 'withdrawn' : r.status,
		lastActivity: r.lastActivity,
		lapsesOn: r.lapsesOn,
		daysLeft: r.daysLeft,
		dueSoon: !q.withdrawnAt && r.dueSoon,
		basis,
		source: r.source
	};
}

export const STATE_LABEL: Record<QualificationState, string> = {
	current: 'current',
	lapsed: 'lapsed',
	withdrawn: 'withdrawn'
};
