// What happened to each joint: the passes logged (by whom, when, under an override or not), the
// overrides and inspections inspectors signed, and the repairs. Read for many joints at once (the
// job page, the API, the data book); the status follows from it ($lib/jobs/status).
import { Op } from 'sequelize';
import { jointStatus } from '$lib/jobs/status';
import type { JointHistory } from '$lib/jobs/types';
import {
	JointInspection,
	JointRepair,
	Procedure,
	ProcedureRevision,
	WeldLog,
	WeldOverride,
	Welder
} from '../models';

/** The round an inspection examined, as it signed it (older content without one: the first). */
export function roundOf(canonical: string): number {
	try {
		const r = (JSON.parse(canonical) as { round?: unknown }).round;
		return typeof r === 'number' ? r : 0;
	} catch {
		return 0;
	}
}

export async function revisionLabels(
	shopId: number,
	revisionIds: number[]
): Promise<Map<number, string>> {
	const out = new Map<number, string>();
	if (!revisionIds.length) return out;
	const revisions = await ProcedureRevision.findAll({
		where: { shopId, id: { [Op.in]: revisionIds } }
	});
	const procedures = await Procedure.findAll({
		where: { shopId, id: { [Op.in]: [...new Set(revisions.map((r) => r.procedureId))] } }
	});
	for (const r of revisions)
		out.set(r.id, `${procedures.find((p) => p.id === r.procedureId)?.number ?? '?'} rev ${r.rev}`);
	return out;
}

export async function historyOf(
	shopId: number,
	jointIds: number[]
): Promise<Map<number, JointHistory>> {
	const out = new Map<number, JointHistory>(
		jointIds.map((id) => [
			id,
			{ round: 0, status: 'open', logs: [], overrides: [], inspections: [], repairs: [] }
		])
	);
	if (!jointIds.length) return out;
	const where = { shopId, jointId: { [Op.in]: jointIds } };
	const byId = { order: [['id', 'ASC']] as [string, string][] };
	const [logs, overrides, inspections, repairs] = await Promise.all([
		WeldLog.findAll({ where, ...byId }),
		WeldOverride.findAll({ where, ...byId }),
		JointInspection.findAll({ where, ...byId }),
		JointRepair.findAll({ where, ...byId })
	]);
	const welderIds = [...new Set([...logs, ...overrides, ...repairs].map((x) => x.welderId))];
	const welders = welderIds.length
		? await Welder.findAll({ where: { shopId, id: { [Op.in]: welderIds } } })
		: [];
	const who = (id: number) => {
		const w = welders.find((x) => x.id === id);
		return { welderName: w?.name ?? '(unknown welder)', stamp: w?.stamp ?? '' };
	};
	const label = await revisionLabels(shopId, [...new Set(repairs.map((r) => r.revisionId))]);
	for (const l of logs)
		out.get(l.jointId)?.logs.push({
			id: l.id,
			pass: l.pass,
			round: l.round,
			weldedOn: l.weldedOn,
			welderId: l.welderId,
			...who(l.welderId),
			revisionId: l.revisionId,
			overrideId: l.overrideId,
			recordedAt: l.createdAt.toISOString()
		});
	for (const o of overrides)
		out.get(o.jointId)?.overrides.push({
			id: o.id,
			welderId: o.welderId,
			...who(o.welderId),
			refusal: o.refusal,
			reason: o.reason,
			printedName: o.printedName,
			role: o.role,
			signedAt: o.signedAt.toISOString(),
			digest: o.digest
		});
	for (const i of inspections)
		out.get(i.jointId)?.inspections.push({
			id: i.id,
			round: roundOf(i.canonical),
			method: i.method,
			extent: i.extent,
			result: i.result,
			note: i.note,
			printedName: i.printedName,
			role: i.role,
			signedAt: i.signedAt.toISOString(),
			digest: i.digest,
			report: i.reportKey ? { name: i.reportName ?? 'report' } : null
		});
	for (const r of repairs) {
		const h = out.get(r.jointId);
		if (!h) continue;
		h.round = Math.max(h.round, r.round);
		h.repairs.push({
			id: r.id,
			round: r.round,
			inspectionId: r.inspectionId,
			revisionId: r.revisionId,
			procedureLabel: label.get(r.revisionId) ?? '?',
			...who(r.welderId),
			note: r.note,
			recordedByName: r.recordedByName,
			recordedAt: r.createdAt.toISOString()
		});
	}
	for (const h of out.values()) h.status = jointStatus(h);
	return out;
}
