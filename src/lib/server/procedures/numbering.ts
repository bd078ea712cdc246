// The shop's numbering patterns: "WPS-{seq:3}" gives WPS-001, WPS-002…; {process} and {yyyy}
// may appear too. The next number skips any already taken, so a hand-typed number never clashes.
import type { RequestEvent } from '@sveltejs/kit';
import type { Transaction } from 'sequelize';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { Pqr, Procedure, ProcedureNumbering } from '../models';
import { applyPattern } from '$lib/procedures/numbering';
import { actingMember, actorOf } from './access';

export { applyPattern };

export const DEFAULT_PATTERNS = { wpsPattern: 'WPS-{seq:3}', pqrPattern: 'PQR-{seq:3}' };

export async function patternsOf(shopId: number, t?: Transaction) {
	const row = await ProcedureNumbering.findByPk(shopId, { transaction: t });
	return row ? { wpsPattern: row.wpsPattern, pqrPattern: row.pqrPattern } : { ...DEFAULT_PATTERNS };
}

/** The first free number of the pattern for a procedure or a PQR in the shop. */
export async function nextNumber(
	shopId: number,
	kind: 'wps' | 'pqr',
	process: string,
	t?: Transaction
): Promise<string> {
	const patterns = await patternsOf(shopId, t);
	const pattern = kind === 'wps' ? patterns.wpsPattern : patterns.pqrPattern;
	const model = kind === 'wps' ? Procedure : Pqr;
	const taken = new Set(
		(
			await (model as typeof Procedure).findAll({
				where: { shopId },
				attributes: ['number'],
				transaction: t
			})
		).map((r) => r.number.toLowerCase())
	);
	for (let seq = taken.size + 1; ; seq++) {
		const candidate = applyPattern(pattern, seq, process);
		if (!taken.has(candidate.toLowerCase())) return candidate;
		if (seq > taken.size + 10_000) return `${candidate}-${Date.now()}`;
	}
}

export async function setPatterns(
	actor: SessionUser,
	input: { wpsPattern: string; pqrPattern: string },
	event: RequestEvent | null = null
): Promise<void> {
	await write(async (t) => {
		const me = await actingMember(actor, ['admin'], t);
		const before = await patternsOf(actor.shopId, t);
		await ProcedureNumbering.upsert({ shopId: actor.shopId, ...input }, { transaction: t });
		await audit(
			{
				shopId: actor.shopId,
				actor: actorOf(me),
				action: 'procedure_numbering.updated',
				objectType: 'shop',
				objectId: actor.shopId,
				before,
				after: input
			},
			event,
			t
		);
	});
}
