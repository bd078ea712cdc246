// Procedures (WPS): every service takes the acting member and stays inside the member's shop.
// The two functions at the end are for the booth sheet and booth view (issue #6).
import type { RevisionVariables } from '$lib/schemas/procedure';
import { ProcedureRevision, Procedure, SignOff } from '../models';
import { checkIntegrity, type Integrity } from './digest';
import { readVariables } from './find';

export * from './access';
export { createProcedure } from './create';
export { notDraftMessage, saveDraft, updateDraft } from './edit';
export {
	approveRevision,
	OWN_WORK,
	returnRevision,
	TOO_MANY_PASSWORDS,
	WRONG_PASSWORD
} from './decide';
export { checkIntegrity, revisionContent, type Integrity } from './digest';
export { diffRevisions, type DiffSide } from './diff';
export {
	recordedOrRefused,
	recordSheetBatchDownload,
	recordSheetDownload,
	type PrintedSheet
} from './sheet-audit';
export { findProcedure, findRevision, readVariables } from './find';
export { linksOf } from './links';
export { listProcedures, reviewQueue, PAGE_SIZE, type ProcedureRow, type QueueItem } from './list';
export { nextNumber, patternsOf, setPatterns, DEFAULT_PATTERNS } from './numbering';
export { revisionPath } from './notify';
export { getRevision, revisionsOf, type RevisionView, type SignOffView } from './read';
export {
	procedureTrail,
	objectTrail,
	shopTrail,
	shopTrailCsv,
	type TrailEntry,
	type TrailFilters
} from './trail';
export { startRevision, submitRevision, withdrawRevision } from './workflow';

export interface ApprovedRevision {
	procedureId: number;
	shopId: number;
	number: string;
	revisionId: number;
	rev: number;
	variables: RevisionVariables;
	signOff: {
		printedName: string;
		role: string;
		meaning: string;
		signedAt: Date;
		digest: string;
	} | null;
	integrity: Integrity;
}

/**
 * The revision in force of a procedure, or null when none is approved (all superseded,
 * withdrawn or never approved). Pass `shopId` to scope it to a member's shop; the booth's public
 * status view may leave it out and show only number and status.
 */
export async function currentApprovedRevision(
	procedureId: number,
	opts: { shopId?: number } = {}
): Promise<ApprovedRevision | null> {
	const procedure = await Procedure.findOne({
		where: { id: procedureId, ...(opts.shopId === undefined ? {} : { shopId: opts.shopId }) }
	});
	if (!procedure) return null;
	const r = await ProcedureRevision.findOne({
		where: { procedureId, shopId: procedure.shopId, state: 'approved' },
		order: [['rev', 'DESC']]
	});
	if (!r) return null;
	const s = await SignOff.findOne({
		where: { revisionId: r.id, meaning: 'approved' },
		order: [['id', 'DESC']]
	});
	return {
		procedureId,
		shopId: procedure.shopId,
		number: procedure.number,
		revisionId: r.id,
		rev: r.rev,
		variables: readVariables(r).variables,
		signOff: s
			? {
					printedName: s.printedName,
					role: s.role,
					meaning: s.meaning,
					signedAt: s.signedAt,
					digest: s.digest
				}
			: null,
		integrity: await checkIntegrity(r.id)
	};
}

/**
 * The digest a revision was signed with and the one its rows give now. `matches` is false on a
 * mismatch (show it as tampering) and null when the revision was never signed.
 */
export async function revisionDigest(
	revisionId: number
): Promise<{ signed: string | null; computed: string; matches: boolean | null }> {
	const i = await checkIntegrity(revisionId);
	return { signed: i.signedDigest, computed: i.computedDigest, matches: i.signed ? i.ok : null };
}
