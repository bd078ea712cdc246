// The booth view for a signed-in member of the revision's shop: the values in the member's units,
// the shade and the job's cautions, the signature (re-verified now; a mismatch goes to the trail),
// and whether the member is a welder who has logged this process today.
import type { RequestEvent } from '@sveltejs/kit';
import { CODE_LABELS, type CodeId } from '$lib/procedures/options';
import type { ShadeAdvice } from '$lib/safety/cautions';
import type { Process } from '$lib/weld';
import type { SessionUser } from '../auth/session-user';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../db/sequelize';
import { ProcedureRevision, RevisionPqr } from '../models';
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
import { integrityOf, signOffsOf } from '../procedures/digest';
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

// The member's welder and whether the process is logged today, in one plain read.
const WELDER_SQL = `SELECT w.name, EXISTS (SELECT 1 FROM continuity_entries c
	WHERE c.welder_id = w.id AND c.process = ? AND c.used_on = ?) AS used
	FROM welders w WHERE w.shop_id = ? AND w.user_id = ? LIMIT 1`;

async function welderToday(
	user: SessionUser,
	process: Process,
	today: string
): Promise<BoothMemberView['welder']> {
	const [row] = await sequelize.query<{ name: string; used: unknown }>(WELDER_SQL, {
		replacements: [process, today, user.shopId, user.id],
		type: QueryTypes.SELECT
	});
	// SQLite answers EXISTS with 0 or 1, PostgreSQL with a boolean.
	return row ? { name: row.name, loggedToday: Number(row.used) > 0 } : null;
}

export async function memberView(
	user: SessionUser,
	status: BoothStatus,
	event: RequestEvent | null
): Promise<BoothMemberView> {
	// One read of each row serves both the page and the integrity check; the check itself (digest
	// and every seal recomputed) runs on every view. Plain rows where nothing needs a model's
	// getters (the sign-offs' dates do, for their seals).
	const [revision, signOffs, pqrLinks] = await Promise.all([
		ProcedureRevision.findOne({
			where: { id: status.revisionId, shopId: user.shopId },
			attributes: ['id', 'shopId', 'procedureId', 'rev', 'state', 'variables', 'process', 'code'],
			rejectOnEmpty: true,
			raw: true
		}),
		signOffsOf(status.revisionId),
		RevisionPqr.findAll({
			where: { revisionId: status.revisionId, shopId: user.shopId },
			attributes: ['id', 'shopId', 'revisionId', 'pqrId'],
			raw: true
		})
	]);
	const { variables: v } = readVariables(revision);
	const today = localDay(new Date(), user.timeZone);
	const [{ integrity, pqrs: read }, welder] = await Promise.all([
		integrityOf({
			revision,
			signOffs,
			pqrLinks,
			procedure: { id: status.procedureId, number: status.number }
		}),
		welderToday(user, v.process, today)
	]);
	if (integrity.signed && !integrity.ok)
		await reportTamper(user, user.shopId, revision.id, integrity, event);
	const signOff =
		signOffs.filter((s) => s.shopId === user.shopId && s.meaning === 'approved').at(-1) ?? null;
	const pqrs = read
		.filter((p) => p.shopId === user.shopId)
		.sort((a, b) => (a.number < b.number ? -1 : a.number > b.number ? 1 : 0));
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
		welder,
		today
	};
}
