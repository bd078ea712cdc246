// What happened to each joint: the passes logged (by whom, when, under an override or not) and
// the overrides inspectors signed. Read for many joints at once (the job page, the data book).
import { Op } from 'sequelize';
import { JointRepair, WeldLog, WeldOverride, Welder } from '../models';
import type { JointHistory } from '$lib/jobs/types';

export async function historyOf(
	shopId: number,
	jointIds: number[]
): Promise<Map<number, JointHistory>> {
	const out = new Map<number, JointHistory>(
		jointIds.map((id) => [id, { round: 0, logs: [], overrides: [] }])
	);
	if (!jointIds.length) return out;
	const where = { shopId, jointId: { [Op.in]: jointIds } };
	const [logs, overrides, repairs] = await Promise.all([
		WeldLog.findAll({ where, order: [['id', 'ASC']] }),
		WeldOverride.findAll({ where, order: [['id', 'ASC']] }),
		JointRepair.findAll({ where, attributes: ['jointId', 'round'] })
	]);
	for (const r of repairs) {
		const h = out.get(r.jointId);
		if (h && r.round > h.round) h.round = r.round;
	}
	const welderIds = [...new Set([...logs, ...overrides].map((x) => x.welderId))];
	const welders = welderIds.length
		? await Welder.findAll({ where: { shopId, id: { [Op.in]: welderIds } } })
		: [];
	const who = (id: number) => {
		const w = welders.find((x) => x.id === id);
		return { welderName: w?.name ?? '(unknown welder)', stamp: w?.stamp ?? '' };
	};
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
	return out;
}
