// Saving a draft. Only a draft changes; the state is re-checked under the write lock and the
// update is conditional on it, so an edit can never land on a revision submitted meanwhile.
import type { RequestEvent } from '@sveltejs/kit';
import type { RevisionForm, RevisionVariables } from '$lib/schemas/procedure';
import { STATE_LABELS } from '$lib/procedures/options';
import { deriveGroupings, formToVariables, recordIdsFrom } from '$lib/procedures/variables';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { ProcedureRevision } from '../models';
import { RefusedError } from '../people/errors';
import { actingMember, actorOf, AUTHOR_ROLES } from './access';
import { findProcedure, findRevision, readVariables, syncHead } from './find';
import { linksOf, setLinks } from './links';
import { auditRevision } from './revision-audit';

export const notDraftMessage = (rev: number, state: string) =>
	state === 'in-review'
		? `Revision ${rev} is in review, so it cannot be edited now. The inspector can return it to draft.`
		: `Revision ${rev} is ${STATE_LABELS[state as keyof typeof STATE_LABELS]?.toLowerCase() ?? state}` +
			`${state === 'approved' ? ' and signed' : ''}; it can no longer be edited. Start a new revision to change it.`;

/** Saves the editor's form (text in the member's units). */
export function updateDraft(
	actor: SessionUser,
	procedureId: number,
	rev: number,
	form: RevisionForm,
	event: RequestEvent | null = null
): Promise<void> {
	return saveDraft(
		actor,
		procedureId,
		rev,
		{
			variables: formToVariables(form),
			pqrIds: form.pqrIds,
			recordIds: recordIdsFrom(form.recordIds)
		},
		event
	);
}

/** Saves a whole variables document (SI, as the API sends it) with the revision's links. */
export async function saveDraft(
	actor: SessionUser,
	procedureId: number,
	rev: number,
	input: { variables: RevisionVariables; pqrIds: number[]; recordIds: number[] },
	event: RequestEvent | null = null
): Promise<void> {
	const variables = deriveGroupings(input.variables);
	await write(async (t) => {
		const me = await actingMember(actor, AUTHOR_ROLES, t);
		const procedure = await findProcedure(actor, procedureId, t);
		const revision = await findRevision(actor, procedureId, rev, t);
		if (revision.state !== 'draft') throw new RefusedError(notDraftMessage(rev, revision.state));
		const before = {
			variables: readVariables(revision).variables,
			...(await linksOf(revision.id, actor.shopId, t))
		};
		const [n] = await ProcedureRevision.update(
			{
				variables: JSON.stringify(variables),
				process: variables.process,
				code: variables.code,
				baseMetalFamily: variables.baseMetals.family
			},
			{ where: { id: revision.id, shopId: actor.shopId, state: 'draft' }, transaction: t }
		);
		if (n !== 1) throw new RefusedError(notDraftMessage(rev, 'in-review'));
		const links = await setLinks(
			revision,
			{ pqrIds: input.pqrIds, recordIds: input.recordIds },
			t,
			{ actor: actorOf(me), event, number: procedure.number }
		);
		await syncHead(procedureId, t);
		await auditRevision(t, event, revision, 'updated', actorOf(me), {
			before,
			after: { variables, ...links }
		});
	});
}
