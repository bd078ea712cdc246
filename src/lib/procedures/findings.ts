// Findings on a revision: the weld core's checks at each end of the ranges, and the ranges
// against what the supporting PQRs qualify (QW-451.1 thickness, positions, P-Number, F-Number,
// process, current type) with the AWS D1.1 requalification triggers. Advice only: nothing here
// stops a save, a submission or a decision.
import type { UnitSystem } from '$lib/weld';
import type { RevisionVariables } from '$lib/schemas/procedure';
import { pqrFindings } from './pqr-findings';
import type { PqrForFindings, ProcedureFinding } from './procedure-finding';
import { weldCoreFindings } from './weld-core-findings';

export type { PqrForFindings, ProcedureCheckId, ProcedureFinding } from './procedure-finding';
export { positionLetters } from './pqr-findings';

/** Every finding on a revision, weld core first, then against the PQRs. Never throws. */
export function revisionFindings(
	v: RevisionVariables,
	pqrs: PqrForFindings[],
	system: UnitSystem
): ProcedureFinding[] {
	try {
		return [...weldCoreFindings(v, system), ...pqrFindings(v, pqrs, system)];
	} catch {
		return [];
	}
}

export const countOf = (fs: ProcedureFinding[], status: ProcedureFinding['status']) =>
	fs.filter((f) => f.status === status).length;
