import type { Transfer } from '$reference/types';
// One revision as its pages and the API show it: values, findings, links, sign-offs and the
// integrity check that every view of a signed revision runs (a mismatch is written to the trail).
import type { RequestEvent } from '@sveltejs/kit';
import { Op } from 'sequelize';
import type { UnitSystem } from '$lib/weld';
import type { RevisionVariables } from '$lib/schemas/procedure';
import { groupsOf, type Group } from '$lib/procedures/display';
import { revisionFindings, type ProcedureFinding } from '$lib/procedures/findings';
import type { RevisionStateId } from '$lib/procedures/options';
import type { PqrQualified } from '$lib/procedures/pqr-values';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { AuditEvent, Pqr, ProcedureRevision, SettingsRecord, SignOff, User } from '../models';
import { AUTHOR_ROLES, REVIEW_ROLES } from './access';
import { checkIntegrity, manifestationOf, type Integrity } from './digest';
import { findProcedure, findRevision, readVariables } from './find';
import { linksOf } from './links';

export interface SignOffView {
	id: number;
	printedName: string;
	role: string;
	meaning: 'approved' | 'returned';
	comment: string | null;
	signedAt: string;
	digest: string;
}

export interface RevisionView {
	procedure: { id: number; number: string; headRev: number; approvedRev: number | null };
	revision: {
		id: number;
		rev: number;
		state: RevisionStateId;
		author: string;
		submittedBy: string | null;
		submittedAt: string | null;
		decidedAt: string | null;
		returnComment: string | null;
		supersededByRev: number | null;
		supersededAt: string | null;
		withdrawnAt: string | null;
		withdrawReason: string | null;
		updatedAt: string;
	};
	variables: RevisionVariables;
	readable: boolean;
	groups: Group[];
	findings: ProcedureFinding[];
	pqrs: {
		id: number;
		number: string;
		title: string;
		state: string;
		certifiedDigest: string | null;
	}[];
	records: {
		id: number;
		weldedOn: string;
		process: string;
		amps: number | null;
		outcome: string | null;
	}[];
	signOffs: SignOffView[];
	integrity: Integrity;
	/** What the viewer may do now (the services check again). */
	can: { edit: boolean; submit: boolean; decide: boolean; withdraw: boolean; newRevision: boolean };
	/** The viewer created, edited or submitted it (so may not decide on it). */
	ownWork: boolean;
}

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);

async function namesOf(shopId: number, ids: (string | null)[]) {
	const want = [...new Set(ids.filter((x): x is string => !!x))];
	const users = want.length
		? await User.findAll({ where: { shopId, id: { [Op.in]: want } }, attributes: ['id', 'name'] })
		: [];
	return (id: string | null) =>
		id ? (users.find((u) => u.id === id)?.name ?? 'former member') : null;
}

/** The PQRs of a revision with what they qualify, for the findings. */
export async function pqrsFor(shopId: number, ids: number[]) {
	if (!ids.length) return [];
	const rows = await Pqr.findAll({
		where: { shopId, id: { [Op.in]: ids } },
		order: [['number', 'ASC']]
	});
	return rows.map((p) => {
		let qualified: PqrQualified | null = null;
		try {
			qualified = JSON.parse(p.qualified) as PqrQualified;
		} catch {
			qualified = null;
		}
		return { row: p, qualified, coupon: couponOf(p.actualValues) };
	});
}

/** Coupon thickness, transfer and test position from a PQR's stored actual values (D1.1, ISO). */
function couponOf(json: string): {
	thicknessMm: number | null;
	transfer: Transfer | null;
	testPosition: string | null;
} {
	try {
		const v = JSON.parse(json) as {
			couponThicknessMm?: unknown;
			transfer?: unknown;
			testPosition?: unknown;
		};
		const t = typeof v.couponThicknessMm === 'number' ? v.couponThicknessMm : null;
		const tr = typeof v.transfer === 'string' ? (v.transfer as Transfer) : null;
		const pos = typeof v.testPosition === 'string' && v.testPosition ? v.testPosition : null;
		return { thicknessMm: t, transfer: tr, testPosition: pos };
	} catch {
		return { thicknessMm: null, transfer: null, testPosition: null };
	}
}

export async function findingsFor(
	shopId: number,
	variables: RevisionVariables,
	pqrIds: number[],
	system: UnitSystem
): Promise<ProcedureFinding[]> {
	const pqrs = await pqrsFor(shopId, pqrIds);
	return revisionFindings(
		variables,
		pqrs.flatMap((p) =>
			p.qualified ? [{ number: p.row.number, qualified: p.qualified, coupon: p.coupon }] : []
		),
		system
	);
}

/** Writes the mismatch to the trail: who saw it, the digest signed and the one computed now. */
export async function reportTamper(
	actor: SessionUser | null,
	shopId: number,
	revisionId: number,
	integrity: Integrity,
	event: RequestEvent | null
): Promise<void> {
	await write((t) =>
		audit(
			{
				shopId,
				actor: actor ? { id: actor.id, name: actor.name } : null,
				action: 'procedure_revision.tamper_detected',
				objectType: 'procedure_revision',
				objectId: revisionId,
				before: { digest: integrity.signedDigest },
				after: { digest: integrity.computedDigest, problems: integrity.problems }
			},
			event,
			t
		)
	);
}

export async function getRevision(
	actor: SessionUser,
	procedureId: number,
	rev: number,
	event: RequestEvent | null = null
): Promise<RevisionView> {
	const procedure = await findProcedure(actor, procedureId);
	const r = await findRevision(actor, procedureId, rev);
	const { variables, readable } = readVariables(r);
	const links = await linksOf(r.id, actor.shopId);
	const [pqrs, records, signOffs, integrity, names, own] = await Promise.all([
		pqrsFor(actor.shopId, links.pqrIds),
		links.recordIds.length
			? SettingsRecord.findAll({
					where: { shopId: actor.shopId, id: { [Op.in]: links.recordIds } },
					order: [['id', 'ASC']]
				})
			: [],
		SignOff.findAll({ where: { revisionId: r.id, shopId: actor.shopId }, order: [['id', 'ASC']] }),
		checkIntegrity(r.id),
		namesOf(actor.shopId, [r.authorId, r.submittedById]),
		AuditEvent.count({
			where: {
				shopId: actor.shopId,
				objectType: 'procedure_revision',
				objectId: String(r.id),
				actorId: actor.id,
				action: {
					[Op.in]: [
						'procedure_revision.created',
						'procedure_revision.updated',
						'procedure_revision.submitted'
					]
				}
			}
		})
	]);
	if (integrity.signed && !integrity.ok)
		await reportTamper(actor, actor.shopId, r.id, integrity, event);
	const findings = revisionFindings(
		variables,
		pqrs.flatMap((p) =>
			p.qualified ? [{ number: p.row.number, qualified: p.qualified, coupon: p.coupon }] : []
		),
		actor.unitSystem
	);
	const author = AUTHOR_ROLES.includes(actor.role);
	const ownWork = own > 0 || r.authorId === actor.id || r.submittedById === actor.id;
	const state = r.state as RevisionStateId;
	return {
		procedure: {
			id: procedure.id,
			number: procedure.number,
			headRev: procedure.headRev,
			approvedRev: procedure.approvedRev ?? null
		},
		revision: {
			id: r.id,
			rev: r.rev,
			state,
			author: names(r.authorId) ?? 'former member',
			submittedBy: names(r.submittedById ?? null),
			submittedAt: iso(r.submittedAt),
			decidedAt: iso(r.decidedAt),
			returnComment: r.returnComment ?? null,
			supersededByRev: r.supersededByRev ?? null,
			supersededAt: iso(r.supersededAt),
			withdrawnAt: iso(r.withdrawnAt),
			withdrawReason: r.withdrawReason ?? null,
			updatedAt: r.updatedAt.toISOString()
		},
		variables,
		readable,
		groups: groupsOf(variables, actor.unitSystem),
		findings,
		pqrs: pqrs.map(({ row }) => ({
			id: row.id,
			number: row.number,
			title: row.title,
			state: row.state,
			certifiedDigest: row.certifiedDigest ?? null
		})),
		records: records.map((x) => ({
			id: x.id,
			weldedOn: x.weldedOn,
			process: x.process,
			amps: x.amps,
			outcome: x.outcome
		})),
		signOffs: signOffs.map((s) => ({ id: s.id, ...manifestationOf(s) })),
		integrity,
		can: {
			edit: author && state === 'draft',
			submit: author && state === 'draft',
			decide: REVIEW_ROLES.includes(actor.role) && state === 'in-review' && !ownWork,
			withdraw: author && state === 'approved',
			newRevision: author && rev === procedure.headRev && !['draft', 'in-review'].includes(state)
		},
		ownWork
	};
}

/** Every revision of a procedure, newest first, for its history table. */
export async function revisionsOf(actor: SessionUser, procedureId: number) {
	await findProcedure(actor, procedureId);
	const rows = await ProcedureRevision.findAll({
		where: { procedureId, shopId: actor.shopId },
		order: [['rev', 'DESC']]
	});
	const names = await namesOf(
		actor.shopId,
		rows.map((r) => r.authorId)
	);
	return rows.map((r) => ({
		id: r.id,
		rev: r.rev,
		state: r.state as RevisionStateId,
		title: readVariables(r).variables.title,
		author: names(r.authorId) ?? 'former member',
		submittedAt: iso(r.submittedAt),
		decidedAt: iso(r.decidedAt),
		updatedAt: r.updatedAt.toISOString()
	}));
}
