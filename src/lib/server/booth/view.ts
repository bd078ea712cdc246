// The booth view for a signed-in member of the revision's shop: the values in the member's units,
// the shade and the job's cautions, the signature (re-verified now; a mismatch goes to the trail),
// and whether the member is a welder who has logged this process today.
import type { RequestEvent } from '@sveltejs/kit';
import { Op } from 'sequelize';
import { CODE_LABELS, type CodeId } from '$lib/procedures/options';
import type { ShadeAdvice } from '$lib/safety/cautions';
import type { Process } from '$lib/weld';
import type { SessionUser } from '../auth/session-user';
import { ContinuityEntry, Pqr, ProcedureRevision, RevisionPqr, SignOff, Welder } from '../models';
import {
	ARC_KEYS,
	atTheArc,
	sheetShade,
	shortDigest,
	utcText,
	valueGroups,
	type Value,
	type ValueGroup
} from '../pdf/sheet-content';
import { checkIntegrity } from '../procedures/digest';
import { readVariables } from '../procedures/find';
import { reportTamper } from '../procedures/read';
import { localDay } from '../welders/dates';
import type { BoothStatus } from './resolve';

export interface BoothMemberView {
	title: string;
	code: string;
	process: Process;
	family: string | null;
	tungsten: string;
	arc: Value[];
	rest: ValueGroup[];
	shade: ShadeAdvice | null;
	pqrs: string[];
	signOff: {
		printedName: string;
		role: string;
		meaning: string;
		signedAt: string;
		digest: string;
	} | null;
	/** False when the stored revision no longer matches its signature. */
	intact: boolean;
	welder: { name: string; loggedToday: boolean } | null;
	today: string;
}

export async function memberView(
	user: SessionUser,
	status: BoothStatus,
	event: RequestEvent | null
): Promise<BoothMemberView> {
	const revision = await ProcedureRevision.findOne({
		where: { id: status.revisionId, shopId: user.shopId },
		rejectOnEmpty: true
	});
	const { variables: v } = readVariables(revision);
	const today = localDay(new Date(), user.timeZone);
	const [integrity, signOff, pqrLinks, welder] = await Promise.all([
		checkIntegrity(revision.id),
		SignOff.findOne({
			where: { revisionId: revision.id, shopId: user.shopId, meaning: 'approved' },
			order: [['id', 'DESC']]
		}),
		RevisionPqr.findAll({ where: { revisionId: revision.id, shopId: user.shopId } }),
		Welder.findOne({ where: { shopId: user.shopId, userId: user.id } })
	]);
	if (integrity.signed && !integrity.ok)
		await reportTamper(user, user.shopId, revision.id, integrity, event);
	const [pqrs, used] = await Promise.all([
		pqrLinks.length
			? Pqr.findAll({
					where: { shopId: user.shopId, id: { [Op.in]: pqrLinks.map((l) => l.pqrId) } },
					order: [['number', 'ASC']]
				})
			: [],
		welder
			? ContinuityEntry.count({ where: { welderId: welder.id, process: v.process, usedOn: today } })
			: 0
	]);
	const edition = v.codeEdition ? `, edition ${v.codeEdition}` : '';
	return {
		title: v.title,
		code: `${CODE_LABELS[v.code as CodeId] ?? v.code}${edition}`,
		process: v.process,
		family: v.baseMetals.family,
		tungsten: v.electrical.tungstenClass,
		arc: atTheArc(v, user.unitSystem),
		rest: valueGroups(v, user.unitSystem)
			.map((g) => ({ ...g, rows: g.rows.filter((r) => !ARC_KEYS.has(r.key ?? '')) }))
			.filter((g) => g.rows.length > 0),
		shade: sheetShade(v),
		pqrs: pqrs.map((p) => `${p.number}${p.title ? ` (${p.title})` : ''}`),
		signOff: signOff
			? {
					printedName: signOff.printedName,
					role: signOff.role,
					meaning: signOff.meaning === 'approved' ? 'Approved' : signOff.meaning,
					signedAt: utcText(signOff.signedAt),
					digest: shortDigest(signOff.digest)
				}
			: null,
		intact: integrity.ok,
		welder: welder ? { name: welder.name, loggedToday: used > 0 } : null,
		today
	};
}
