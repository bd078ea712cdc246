import type { RequestEvent } from '@sveltejs/kit';
import type { Transaction } from 'sequelize';
import { audit } from '../audit';

/**
 * The steps of a revision's life and the code the audit trail names each by. Spelled out whole
 * (not built from the step) so the codes stay searchable and action-labels.test.ts finds them.
 */
export const REVISION_AUDIT_CODES = {
	created: 'procedure_revision.created',
	updated: 'procedure_revision.updated',
	submitted: 'procedure_revision.submitted',
	approved: 'procedure_revision.approved',
	returned: 'procedure_revision.returned',
	superseded: 'procedure_revision.superseded',
	withdrawn: 'procedure_revision.withdrawn',
	signature_refused: 'procedure_revision.signature_refused'
} as const;

export type RevisionStep = keyof typeof REVISION_AUDIT_CODES;

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
	const action = REVISION_AUDIT_CODES[step];
	const entry = { shopId: revision.shopId, actor, action, objectType: 'procedure_revision' };
	return audit({ ...entry, objectId: revision.id, ...change }, event, t);
}
