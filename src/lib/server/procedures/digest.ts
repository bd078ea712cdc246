// What a signature covers, recomputed from the rows as they are now: the canonical JSON of a
// revision (procedure number, revision number, variables, PQRs with their certified digests,
// cited records, and the SHA-256 of every attachment), and of a certified PQR.
import { Op, type Transaction } from 'sequelize';
import {
	Pqr,
	PqrReport,
	Procedure,
	ProcedureRevision,
	RevisionPqr,
	RevisionRecord,
	SignOff
} from '../models';
import { canonicalJson, digestOf, sha256Text } from './canonical';

const parse = (json: string): unknown => {
	try {
		return JSON.parse(json);
	} catch {
		// A document that no longer parses is signed as its raw text, so it still mismatches.
		return { unreadable: json };
	}
};

async function reportsOf(shopId: number, pqrIds: number[], t?: Transaction) {
	if (!pqrIds.length) return [];
	const rows = await PqrReport.findAll({
		where: { shopId, pqrId: { [Op.in]: pqrIds }, removedAt: null },
		order: [['id', 'ASC']],
		transaction: t
	});
	return rows.map((r) => ({
		pqrId: r.pqrId,
		reportId: r.id,
		name: r.originalName,
		sha256: r.sha256
	}));
}

/** The certified content of a PQR, as signed by its certifier. */
export async function pqrCanonical(pqr: Pqr, t?: Transaction) {
	const reports = await reportsOf(pqr.shopId, [pqr.id], t);
	return {
		kind: 'pqr',
		v: 1,
		pqr: { id: pqr.id, number: pqr.number, title: pqr.title },
		values: parse(pqr.actualValues),
		tests: parse(pqr.tests),
		qualified: parse(pqr.qualified),
		attachments: reports.map((r) => ({ reportId: r.reportId, name: r.name, sha256: r.sha256 }))
	};
}

export async function pqrDigest(pqr: Pqr, t?: Transaction): Promise<string> {
	return digestOf(await pqrCanonical(pqr, t));
}

export interface RevisionContent {
	canonical: unknown;
	json: string;
	digest: string;
}

/** The revision's canonical content and its digest, from the rows as stored now. */
export async function revisionContent(
	revisionId: number,
	t?: Transaction
): Promise<RevisionContent> {
	const revision = await ProcedureRevision.findByPk(revisionId, {
		rejectOnEmpty: true,
		transaction: t
	});
	return contentOf(revision, await pqrLinksOf(revision, t), t);
}

const pqrLinksOf = (revision: ProcedureRevision, t?: Transaction) =>
	RevisionPqr.findAll({
		where: { revisionId: revision.id, shopId: revision.shopId },
		transaction: t
	});

/** The content of a revision already read, with its PQR links (read with it, in the same shop). */
async function contentOf(
	revision: ProcedureRevision,
	pqrLinks: RevisionPqr[],
	t?: Transaction
): Promise<RevisionContent> {
	const revisionId = revision.id;
	const [procedure, recordLinks] = await Promise.all([
		Procedure.findByPk(revision.procedureId, { rejectOnEmpty: true, transaction: t }),
		RevisionRecord.findAll({ where: { revisionId, shopId: revision.shopId }, transaction: t })
	]);
	const pqrIds = pqrLinks.map((l) => l.pqrId).sort((a, b) => a - b);
	const pqrs = pqrIds.length
		? await Pqr.findAll({
				where: { id: { [Op.in]: pqrIds }, shopId: revision.shopId },
				transaction: t
			})
		: [];
	const reports = await reportsOf(revision.shopId, pqrIds, t);
	const canonical = {
		kind: 'procedure-revision',
		v: 1,
		procedure: { id: procedure.id, number: procedure.number },
		revision: { id: revision.id, rev: revision.rev },
		variables: parse(revision.variables),
		pqrs: pqrIds.map((id) => {
			const p = pqrs.find((x) => x.id === id);
			return { id, number: p?.number ?? null, digest: p?.certifiedDigest ?? null };
		}),
		records: recordLinks.map((l) => l.recordId).sort((a, b) => a - b),
		attachments: reports.map((r) => ({ pqrId: r.pqrId, reportId: r.reportId, sha256: r.sha256 }))
	};
	const json = canonicalJson(canonical);
	return { canonical, json, digest: sha256Text(json) };
}

/** The seal binds a sign-off's manifestation (who, role, meaning, when, comment) to the digest. */
export function sealOf(s: {
	revisionId: number;
	userId: string;
	printedName: string;
	role: string;
	meaning: string;
	comment: string | null;
	signedAt: Date;
	digest: string;
}): string {
	return digestOf({
		revisionId: s.revisionId,
		userId: s.userId,
		printedName: s.printedName,
		role: s.role,
		meaning: s.meaning,
		comment: s.comment,
		signedAt: s.signedAt.toISOString(),
		digest: s.digest
	});
}

export interface Integrity {
	/** False when the revision was never approved (nothing signed to check). */
	signed: boolean;
	ok: boolean;
	signedDigest: string | null;
	computedDigest: string;
	problems: string[];
}

/** Recomputes the digest and every seal of a revision's sign-offs against what they recorded. */
export async function checkIntegrity(revisionId: number, t?: Transaction): Promise<Integrity> {
	// The revision and its PQR links are read once and serve both the digest and the checks below.
	const [revision, signOffs] = await Promise.all([
		ProcedureRevision.findByPk(revisionId, { rejectOnEmpty: true, transaction: t }),
		SignOff.findAll({ where: { revisionId }, order: [['id', 'ASC']], transaction: t })
	]);
	const pqrLinks = await pqrLinksOf(revision, t);
	const content = await contentOf(revision, pqrLinks, t);
	const problems: string[] = [];
	for (const s of signOffs)
		if (sealOf(s) !== s.seal)
			problems.push(`The ${s.meaning} sign-off of ${s.printedName} does not match its seal.`);
	const approval = signOffs.filter((s) => s.meaning === 'approved').at(-1) ?? null;
	if (approval && approval.digest !== content.digest)
		problems.push('The revision as stored now differs from what was signed.');
	if (!approval && ['approved', 'superseded', 'withdrawn'].includes(revision.state))
		problems.push('The revision is marked signed but carries no approving signature.');
	// The PQRs a signed revision leans on must still be what their certifiers signed.
	if (approval) {
		const pqrs = pqrLinks.length
			? await Pqr.findAll({
					where: { id: { [Op.in]: pqrLinks.map((l) => l.pqrId) } },
					transaction: t
				})
			: [];
		for (const p of pqrs)
			if (p.certifiedDigest && (await pqrDigest(p, t)) !== p.certifiedDigest)
				problems.push(`${p.number} differs from what was certified.`);
	}
	return {
		signed: !!approval || problems.length > 0,
		ok: problems.length === 0,
		signedDigest: approval?.digest ?? null,
		computedDigest: content.digest,
		problems
	};
}
