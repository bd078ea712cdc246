// Two revisions side by side. Showing a signed revision's values is a view of it, so each one shown
// is checked against its signature and a mismatch goes on the trail, as the revision page does.
import type { RequestEvent } from '@sveltejs/kit';
import { diffRows } from '$lib/procedures/display';
import type { RevisionStateId } from '$lib/procedures/options';
import type { SessionUser } from '../auth/session-user';
import { checkIntegrity, type Integrity } from './digest';
import { findProcedure, findRevision, readVariables } from './find';
import { reportTamper, revisionsOf } from './read';

export interface DiffSide {
	rev: number;
	state: RevisionStateId;
	integrity: Integrity;
}

/** Revision `rev` against `asked` (else the newest other revision, else itself). */
export async function diffRevisions(
	actor: SessionUser,
	procedureId: number,
	rev: number,
	asked: number | null,
	event: RequestEvent | null = null
) {
	const procedure = await findProcedure(actor, procedureId);
	const revisions = await revisionsOf(actor, procedureId);
	const other =
		revisions.find((r) => r.rev === asked)?.rev ?? revisions.find((r) => r.rev !== rev)?.rev ?? rev;
	const [a, b] = await Promise.all([
		findRevision(actor, procedureId, rev),
		findRevision(actor, procedureId, other)
	]);
	const [ia, ib] = await Promise.all([
		checkIntegrity(a.id),
		b.id === a.id ? null : checkIntegrity(b.id)
	]);
	const sides: [typeof a, Integrity][] = [
		[a, ia],
		...(ib ? [[b, ib] as [typeof b, Integrity]] : [])
	];
	for (const [r, i] of sides)
		if (i.signed && !i.ok) await reportTamper(actor, actor.shopId, r.id, i, event);
	const side = (r: typeof a, integrity: Integrity): DiffSide => ({
		rev: r.rev,
		state: r.state as RevisionStateId,
		integrity
	});
	return {
		procedure: { id: procedure.id, number: procedure.number },
		a: side(a, ia),
		b: side(b, ib ?? ia),
		revisions: revisions.map((r) => r.rev),
		rows: diffRows(readVariables(a).variables, readVariables(b).variables, actor.unitSystem)
	};
}
