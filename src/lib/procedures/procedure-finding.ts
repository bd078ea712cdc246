// What a finding on a procedure revision is, shared by the modules that make them.
import type { CheckId, Finding } from '$lib/weld';
import type { ProcedureOnlyCheckId } from './check-catalogue';
import type { PqrWithCoupon } from './code-findings';

export type ProcedureCheckId = CheckId | ProcedureOnlyCheckId;

export interface ProcedureFinding extends Omit<Finding, 'check'> {
	check: ProcedureCheckId;
	/** The display row the finding belongs beside (see display.ts). */
	at: string;
	/** Which end of the ranges the weld core checked; absent when both ends agree. */
	end?: 'low' | 'high';
	/** The PQR compared against. */
	pqr?: string;
}

/** A cited PQR: what it qualifies and, where read, its coupon (for the D1.1 and ISO rows). */
export type PqrForFindings = PqrWithCoupon;

/** A stored null as the weld core's "not given". */
export const n = <T>(v: T | null | undefined): T | undefined => (v === null ? undefined : v);
