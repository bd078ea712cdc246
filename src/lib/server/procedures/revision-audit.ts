import type { RequestEvent } from '@sveltejs/kit';
import type { Transaction } from 'sequelize';
import { audit } from '../audit';

/** The steps of a revision's life the audit trail names (`procedure_revision.<step>`). */
export type RevisionStep =
	| 'created'
	| 'updated'
	| 'submitted'
	| 'approved'
	| 'returned'
	| 'superseded'
	| 'withdrawn'
	| 'signature_refused';

/**
 * Appends `procedure_revision.<step>` about one revision, in the transaction that made the step:
 * every step of the workflow writes the same entry but for what it changed, so the trail reads
 * alike whichever service wrote it. The change comes last so a call reads as one short block.
 */
export function auditRevision(
	t: Transaction | undefined,
	event: RequestEvent | null,
	revision: { id: number; shopId: number },
	step: RevisionStep,
	actor: { id: string; name: string },
	change: { before?: unknown; after?: unknown }
): Promise<void> {
	const action = `procedure_revision.${step}`;
	const entry = { shopId: revision.shopId, actor, action, objectType: 'procedure_revision' };
	return audit({ ...entry, objectId: revision.id, ...change }, event, t);
}
