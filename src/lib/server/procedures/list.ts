// The procedure list (filters on the indexed mirror columns) and the inspector's review queue.
import { Op, type WhereOptions } from 'sequelize';
import { likeOp } from '../db/dialect';
import { sequelize } from '../db/sequelize';
import type { ProcedureFilters } from '$lib/schemas/procedure';
import type { RevisionStateId } from '$lib/procedures/options';
import { countOf } from '$lib/procedures/findings';
import type { SessionUser } from '../auth/session-user';
import { Procedure, ProcedureRevision, User } from '../models';
import { readVariables } from './find';
import { linksOf } from './links';
import { findingsFor } from './read';

export const PAGE_SIZE = 50;

export interface ProcedureRow {
	id: number;
	number: string;
	title: string;
	code: string;
	process: string;
	family: string | null;
	state: RevisionStateId;
	headRev: number;
	approvedRev: number | null;
	updatedAt: string;
}

export async function listProcedures(
	actor: SessionUser,
	f: ProcedureFilters
): Promise<{ rows: ProcedureRow[]; total: number; page: number; pages: number }> {
	const and: WhereOptions<Procedure>[] = [{ shopId: actor.shopId }];
	if (f.state) and.push({ state: f.state });
	if (f.process) and.push({ process: f.process });
	if (f.code) and.push({ code: f.code });
	if (f.family) and.push({ baseMetalFamily: f.family });
	if (f.q)
		for (const w of f.q.toLowerCase().replace(/%/g, '').split(/\s+/).filter(Boolean).slice(0, 5))
			and.push({ searchText: { [likeOp(sequelize)]: `%${w}%` } });
	const { rows, count } = await Procedure.findAndCountAll({
		where: { [Op.and]: and },
		order: [
			['number', 'ASC'],
			['id', 'ASC']
		],
		limit: PAGE_SIZE,
		offset: (f.page - 1) * PAGE_SIZE,
		// Only the columns the list shows, as plain rows: nothing here is saved back.
		attributes: [
			'id',
			'number',
			'title',
			'code',
			'process',
			'baseMetalFamily',
			'state',
			'headRev',
			'approvedRev',
			'updatedAt'
		],
		raw: true
	});
	return {
		rows: rows.map((p) => ({
			id: p.id,
			number: p.number,
			title: p.title,
			code: p.code,
			process: p.process,
			family: p.baseMetalFamily,
			state: p.state as RevisionStateId,
			headRev: p.headRev,
			approvedRev: p.approvedRev ?? null,
			// A plain row's date is the driver's: text on SQLite, a Date on PostgreSQL.
			updatedAt: new Date(p.updatedAt).toISOString()
		})),
		total: count,
		page: f.page,
		pages: Math.max(1, Math.ceil(count / PAGE_SIZE))
	};
}

export interface QueueItem {
	procedureId: number;
	number: string;
	rev: number;
	title: string;
	process: string;
	submittedBy: string;
	submittedAt: string | null;
	outside: number;
	caution: number;
	ownWork: boolean;
}

/** Revisions waiting for a decision, oldest first, each with its count of findings. */
export async function reviewQueue(actor: SessionUser): Promise<QueueItem[]> {
	const rows = await ProcedureRevision.findAll({
		where: { shopId: actor.shopId, state: 'in-review' },
		order: [
			['submittedAt', 'ASC'],
			['id', 'ASC']
		],
		limit: 200
	});
	const procedures = await Procedure.findAll({
		where: { shopId: actor.shopId, id: { [Op.in]: rows.map((r) => r.procedureId) } }
	});
	const people = await User.findAll({
		where: {
			shopId: actor.shopId,
			id: { [Op.in]: rows.flatMap((r) => (r.submittedById ? [r.submittedById] : [])) }
		},
		attributes: ['id', 'name']
	});
	return Promise.all(
		rows.map(async (r) => {
			const { variables } = readVariables(r);
			const { pqrIds } = await linksOf(r.id, actor.shopId);
			const findings = await findingsFor(actor.shopId, variables, pqrIds, actor.unitSystem);
			return {
				procedureId: r.procedureId,
				number: procedures.find((p) => p.id === r.procedureId)?.number ?? '?',
				rev: r.rev,
				title: variables.title,
				process: variables.process,
				submittedBy: people.find((u) => u.id === r.submittedById)?.name ?? 'former member',
				submittedAt: r.submittedAt?.toISOString() ?? null,
				outside: countOf(findings, 'outside'),
				caution: countOf(findings, 'caution'),
				ownWork: r.authorId === actor.id || r.submittedById === actor.id
			};
		})
	);
}
