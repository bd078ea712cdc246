// What a data book is compiled from, read from the records as they are now: the job and its joints
// with their history, the procedure revisions they cite (with the digest of each as stored and as
// signed), the welders (as of the compile day, and as of each weld's day) and the inspection
// reports stored with the inspections. The same read serves the verification page, which digests
// the sections again and compares them with the manifest.
import { Op } from 'sequelize';
import type { JointView } from '$lib/jobs/types';
import { digestOf } from '../../procedures/canonical';
import { JointInspection, Procedure, ProcedureRevision, Shop } from '../../models';
import { checkIntegrity } from '../../procedures/digest';
import { loadWelders, type WelderView } from '../../welders/read';
import { jobView, type JobView } from '../read';
import type { RecordDigests } from './manifest';

export interface CitedRevision {
	id: number;
	procedureId: number;
	number: string;
	rev: number;
	state: string;
	process: string;
	/** The approving signature's digest; null when the revision was never signed. */
	signedDigest: string | null;
	/** The digest of the revision as stored now. */
	digest: string;
	intact: boolean;
}

export interface StoredReport {
	inspectionId: number;
	jointId: number;
	key: string;
	name: string;
	sha256: string | null;
}

export interface BookRecords {
	shopName: string;
	units: 'imperial' | 'metric';
	job: JobView;
	revisions: CitedRevision[];
	welders: WelderView[];
	reports: StoredReport[];
}

const revisionIdsOf = (joints: JointView[]): number[] => [
	...new Set(
		joints.flatMap((j) => [
			j.revisionId,
			...j.history.logs.map((l) => l.revisionId),
			...j.history.repairs.map((r) => r.revisionId)
		])
	)
];

export const welderIdsOf = (joints: JointView[]): number[] => [
	...new Set(
		joints.flatMap((j) => [
			...j.history.logs.map((l) => l.welderId),
			...j.history.overrides.map((o) => o.welderId)
		])
	)
];

async function citedRevisions(shopId: number, ids: number[]): Promise<CitedRevision[]> {
	if (!ids.length) return [];
	const revisions = await ProcedureRevision.findAll({
		where: { shopId, id: { [Op.in]: ids } },
		order: [['id', 'ASC']]
	});
	const procedures = await Procedure.findAll({
		where: { shopId, id: { [Op.in]: [...new Set(revisions.map((r) => r.procedureId))] } }
	});
	const out: CitedRevision[] = [];
	for (const r of revisions) {
		const integrity = await checkIntegrity(r.id);
		out.push({
			id: r.id,
			procedureId: r.procedureId,
			number: procedures.find((p) => p.id === r.procedureId)?.number ?? '(unknown)',
			rev: r.rev,
			state: r.state,
			process: r.process ?? '',
			signedDigest: integrity.signedDigest,
			digest: integrity.computedDigest,
			intact: integrity.ok
		});
	}
	return out.sort(
		(a, b) => a.number.localeCompare(b.number, 'en', { numeric: true }) || a.rev - b.rev
	);
}

/** Reports stored with the job's inspections (key, file name, SHA-256 as uploaded). */
async function storedReports(shopId: number, jointIds: number[]): Promise<StoredReport[]> {
	if (!jointIds.length) return [];
	const rows = await JointInspection.findAll({
		where: { shopId, jointId: { [Op.in]: jointIds }, reportKey: { [Op.ne]: null } },
		order: [['id', 'ASC']]
	});
	return rows.map((i) => ({
		inspectionId: i.id,
		jointId: i.jointId,
		key: i.reportKey!,
		name: i.reportName ?? `report-${i.id}`,
		sha256: i.reportSha256
	}));
}

export async function bookRecords(
	actor: { shopId: number },
	jobId: number,
	today: string
): Promise<BookRecords> {
	const job = await jobView(actor, jobId);
	const shop = await Shop.findByPk(actor.shopId, { rejectOnEmpty: true });
	const welderIds = welderIdsOf(job.joints);
	const [revisions, welders, reports] = await Promise.all([
		citedRevisions(actor.shopId, revisionIdsOf(job.joints)),
		welderIds.length ? loadWelders(actor.shopId, today, { ids: welderIds }) : [],
		storedReports(
			actor.shopId,
			job.joints.map((j) => j.id)
		)
	]);
	return { shopName: shop.name, units: shop.unitSystem, job, revisions, welders, reports };
}

/**
 * The records as facts that do not move with the calendar (no "current until", no revision
 * state): what was recorded, signed and cited. Each section is digested on its own, so the
 * verification page can say which part changed.
 */
export function recordSections(r: Pick<BookRecords, 'job' | 'revisions' | 'welders' | 'reports'>) {
	const j = r.job;
	const joints = j.joints;
	return {
		job: {
			number: j.number,
			customer: j.customer,
			part: j.part,
			drawing: j.drawing,
			drawingRev: j.drawingRev,
			code: j.code,
			dueOn: j.dueOn
		},
		joints: joints.map((x) => ({
			id: x.id,
			mark: x.mark,
			jointType: x.jointType,
			size: x.size,
			baseMetals: x.baseMetals,
			position: x.position,
			revisionId: x.revisionId
		})),
		welds: joints.flatMap((x) =>
			x.history.logs.map((l) => ({
				id: l.id,
				jointId: x.id,
				pass: l.pass,
				round: l.round,
				weldedOn: l.weldedOn,
				welderId: l.welderId,
				revisionId: l.revisionId,
				overrideId: l.overrideId
			}))
		),
		overrides: joints.flatMap((x) =>
			x.history.overrides.map((o) => ({
				id: o.id,
				jointId: x.id,
				welderId: o.welderId,
				reason: o.reason,
				signedAt: o.signedAt,
				digest: o.digest
			}))
		),
		inspections: joints.flatMap((x) =>
			x.history.inspections.map((i) => ({
				id: i.id,
				jointId: x.id,
				round: i.round,
				method: i.method,
				extent: i.extent,
				result: i.result,
				signedAt: i.signedAt,
				digest: i.digest,
				report: r.reports.find((p) => p.inspectionId === i.id)?.sha256 ?? null
			}))
		),
		repairs: joints.flatMap((x) =>
			x.history.repairs.map((p) => ({
				id: p.id,
				jointId: x.id,
				round: p.round,
				inspectionId: p.inspectionId,
				revisionId: p.revisionId,
				recordedAt: p.recordedAt
			}))
		),
		procedures: r.revisions.map((v) => ({
			id: v.id,
			number: v.number,
			rev: v.rev,
			digest: v.digest
		})),
		welders: r.welders.map((w) => ({ id: w.id, name: w.name, stamp: w.stamp }))
	};
}

export type RecordSections = ReturnType<typeof recordSections>;

export function recordDigests(sections: RecordSections): RecordDigests {
	const names = Object.keys(sections) as (keyof RecordSections)[];
	const digests = Object.fromEntries(names.map((k) => [k, digestOf(sections[k])]));
	const counts = Object.fromEntries(
		names
			.filter((k) => Array.isArray(sections[k]))
			.map((k) => [k, (sections[k] as unknown[]).length])
	);
	return { digest: digestOf(digests), sections: digests, counts };
}
