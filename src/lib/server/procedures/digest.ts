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
	return pqrCanonicalWith(pqr, await reportsOf(pqr.shopId, [pqr.id], t));
}

/** The same, from the PQR's live reports already read (in its shop) in this request. */
function pqrCanonicalWith(pqr: Pqr, reports: Awaited<ReturnType<typeof reportsOf>>) {
	return {
		kind: 'pqr',
		v: 1,
		pqr: { id: pqr.id, number: pqr.number, title: pqr.title },
		values: parse(pqr.actualValues),
		tests: parse(pqr.tests),
		qualified: parse(pqr.qualified),
		attachments: reports
			.filter((r) => r.pqrId === pqr.id)
			.map((r) => ({ reportId: r.reportId, name: r.name, sha256: r.sha256 }))
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

/** What the digest is computed from, besides the revision: read now, in the revision's shop. */
interface ContentRows {
	pqrs: Pqr[];
	reports: Awaited<ReturnType<typeof reportsOf>>;
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
	return (await contentOf(revision, await pqrLinksOf(revision, t), null, t)).content;
}

const pqrLinksOf = (revision: ProcedureRevision, t?: Transaction) =>
	RevisionPqr.findAll({
		where: { revisionId: revision.id, shopId: revision.shopId },
		transaction: t
	});

/**
 * The content of a revision already read, with its PQR links (read with it, in the same shop).
 * `procedure` is the revision's procedure when the caller read it in this request already.
 */
async function contentOf(
	revision: ProcedureRevision,
	pqrLinks: RevisionPqr[],
	procedureRead: { id: number; number: string } | null,
	t?: Transaction
): Promise<{ content: RevisionContent; rows: ContentRows }> {
	const revisionId = revision.id;
	const [procedure, recordLinks] = await Promise.all([
		procedureRead?.id === revision.procedureId
			? procedureRead
			: Procedure.findByPk(revision.procedureId, { rejectOnEmpty: true, transaction: t }),
		RevisionRecord.findAll({
			where: { revisionId, shopId: revision.shopId },
			attributes: ['recordId'],
			raw: true,
			transaction: t
		})
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
	return { content: { canonical, json, digest: sha256Text(json) }, rows: { pqrs, reports } };
}

interface Manifestation {
	printedName: string;
	role: string;
	meaning: string;
	comment: string | null;
	signedAt: Date;
	digest: string;
}

/** A sign-off's manifestation (who, role, meaning, when, comment, digest), as sealed and shown. */
export function manifestationOf<M extends Manifestation>(s: M) {
	const { printedName, role, meaning, comment, digest }: Omit<M, 'signedAt'> = s;
	return { printedName, role, meaning, comment, signedAt: s.signedAt.toISOString(), digest };
}

/** The seal binds a sign-off's manifestation to the signer and the revision (keys sorted). */
export function sealOf(s: Manifestation & { revisionId: number; userId: string }): string {
	return digestOf({ revisionId: s.revisionId, userId: s.userId, ...manifestationOf(s) });
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
		signOffsOf(revisionId, t)
	]);
	const pqrLinks = await pqrLinksOf(revision, t);
	return (await integrityOf({ revision, signOffs, pqrLinks }, t)).integrity;
}

/** Every sign-off of a revision, oldest first, as `integrityOf` takes them. */
export const signOffsOf = (revisionId: number, t?: Transaction) =>
	SignOff.findAll({ where: { revisionId }, order: [['id', 'ASC']], transaction: t });

/**
 * The same checks from rows the caller read in this request (the booth view reads them for its
 * own page too): the revision, all its sign-offs (`signOffsOf`), its PQR links in its shop, and
 * optionally its procedure. Nothing is kept between requests: every view recomputes the digest
 * and every seal. Also hands back the PQRs read for the digest (in the revision's shop).
 */
export async function integrityOf(
	read: {
		revision: ProcedureRevision;
		signOffs: SignOff[];
		pqrLinks: RevisionPqr[];
		procedure?: { id: number; number: string };
	},
	t?: Transaction
): Promise<{ integrity: Integrity; pqrs: Pqr[] }> {
	const { revision, signOffs, pqrLinks } = read;
	const { content, rows } = await contentOf(revision, pqrLinks, read.procedure ?? null, t);
	const problems: string[] = [];
	for (const s of signOffs)
		if (sealOf(s) !== s.seal)
			problems.push(`The ${s.meaning} sign-off of ${s.printedName} does not match its seal.`);
	const approval = signOffs.filter((s) => s.meaning === 'approved').at(-1) ?? null;
	if (approval && approval.digest !== content.digest)
		problems.push('The revision as stored now differs from what was signed.');
	if (!approval && ['approved', 'superseded', 'withdrawn'].includes(revision.state))
		problems.push('The revision is marked signed but carries no approving signature.');
	// The PQRs a signed revision leans on must still be what their certifiers signed. The digest's
	// read serves when it found every linked PQR (then each is in the revision's shop, and so are
	// the reports read with them); otherwise they are read again wherever they are.
	if (approval) {
		const ids = new Set(pqrLinks.map((l) => l.pqrId));
		const allRead = rows.pqrs.length === ids.size;
		const pqrs = allRead
			? rows.pqrs
			: ids.size
				? await Pqr.findAll({ where: { id: { [Op.in]: [...ids] } }, transaction: t })
				: [];
		for (const p of pqrs) {
			if (!p.certifiedDigest) continue;
			const digest = allRead ? digestOf(pqrCanonicalWith(p, rows.reports)) : await pqrDigest(p, t);
			if (digest !== p.certifiedDigest)
				problems.push(`${p.number} differs from what was certified.`);
		}
	}
	return {
		integrity: {
			signed: !!approval || problems.length > 0,
			ok: problems.length === 0,
			signedDigest: approval?.digest ?? null,
			computedDigest: content.digest,
			problems
		},
		pqrs: rows.pqrs
	};
}
