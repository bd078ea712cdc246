// Loading procedures and revisions inside the actor's shop (another shop's id is "not found"),
// reading the stored document, and keeping the procedure's mirror of its head revision.
import type { Transaction } from 'sequelize';
import { variablesSchema, type RevisionVariables } from '$lib/schemas/procedure';
import { emptyVariables } from '$lib/procedures/variables';
import type { SessionUser } from '../auth/session-user';
import { Procedure, ProcedureRevision } from '../models';
import { NotFoundError } from '../people/errors';

/**
 * Inside a write transaction the procedure's row stays locked until it ends (FOR UPDATE on
 * PostgreSQL): every change of a procedure or its revisions (submit, decide, withdraw, new
 * revision, edit) goes through here, so they take turns per procedure in any number of processes.
 */
export async function findProcedure(
	actor: Pick<SessionUser, 'shopId'>,
	id: number,
	t?: Transaction
): Promise<Procedure> {
	const p = await Procedure.findOne({
		where: { id, shopId: actor.shopId },
		transaction: t,
		...(t ? { lock: t.LOCK.UPDATE } : {})
	});
	if (!p) throw new NotFoundError('No such procedure in your shop.');
	return p;
}

export async function findRevision(
	actor: Pick<SessionUser, 'shopId'>,
	procedureId: number,
	rev: number,
	t?: Transaction
): Promise<ProcedureRevision> {
	const r = await ProcedureRevision.findOne({
		where: { procedureId, rev, shopId: actor.shopId },
		transaction: t
	});
	if (!r) throw new NotFoundError('No such revision of this procedure.');
	return r;
}

/** The stored document; one that no longer validates reads as empty and says so. */
export function readVariables(r: Pick<ProcedureRevision, 'variables' | 'process' | 'code'>): {
	variables: RevisionVariables;
	readable: boolean;
} {
	try {
		const parsed = variablesSchema.safeParse(JSON.parse(r.variables));
		if (parsed.success) return { variables: parsed.data, readable: true };
	} catch {
		// fall through
	}
	const process = (
		['GTAW', 'GMAW', 'FCAW', 'SMAW'].includes(r.process) ? r.process : 'GTAW'
	) as RevisionVariables['process'];
	return {
		variables: emptyVariables({
			title: '(stored variables cannot be read)',
			code: 'shop',
			process
		}),
		readable: false
	};
}

const searchOf = (number: string, v: RevisionVariables) =>
	[
		number,
		v.title,
		v.process,
		...v.baseMetals.specs,
		...v.fillerMetals.classifications,
		v.gas.shielding
	]
		.join(' ')
		.toLowerCase();

/** Mirrors the head revision (newest) and the approved one onto the procedure row. */
export async function syncHead(procedureId: number, t: Transaction): Promise<void> {
	const procedure = await Procedure.findByPk(procedureId, { rejectOnEmpty: true, transaction: t });
	const revisions = await ProcedureRevision.findAll({
		where: { procedureId, shopId: procedure.shopId },
		order: [['rev', 'DESC']],
		transaction: t
	});
	const head = revisions[0];
	if (!head) return;
	const { variables } = readVariables(head);
	await procedure.update(
		{
			title: variables.title,
			code: variables.code,
			process: variables.process,
			baseMetalFamily: variables.baseMetals.family,
			state: head.state,
			headRev: head.rev,
			approvedRev: revisions.find((r) => r.state === 'approved')?.rev ?? null,
			searchText: searchOf(procedure.number, variables)
		},
		{ transaction: t }
	);
}
