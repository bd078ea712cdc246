// What a scanned booth link points at, live: the revision's state now, and the revision of the
// same procedure in force now (with its own link) when that is another one.
import type { RevisionStateId } from '$lib/procedures/options';
import { BoothLink, Procedure, ProcedureRevision, Shop } from '../models';
import { BOOTH_TOKEN, boothPath, ensureBoothLink } from './links';

export interface BoothStatus {
	link: { id: number; revoked: boolean };
	shopId: number;
	shopName: string;
	procedureId: number;
	number: string;
	revisionId: number;
	rev: number;
	state: RevisionStateId;
	supersededByRev: number | null;
	withdrawnAt: Date | null;
	/** The revision in force now when it is not this one, with the path of its booth view. */
	current: { rev: number; revisionId: number; path: string | null } | null;
}

/** Null for a malformed or unknown token; a withdrawn link resolves with `link.revoked`. */
export async function resolveBoothToken(token: string): Promise<BoothStatus | null> {
	if (!BOOTH_TOKEN.test(token)) return null;
	const link = await BoothLink.findOne({ where: { token } });
	if (!link) return null;
	const [revision, procedure, shop] = await Promise.all([
		ProcedureRevision.findOne({ where: { id: link.revisionId, shopId: link.shopId } }),
		Procedure.findOne({ where: { id: link.procedureId, shopId: link.shopId } }),
		Shop.findByPk(link.shopId)
	]);
	if (!revision || !procedure || !shop) return null;
	let current: BoothStatus['current'] = null;
	if (revision.state !== 'approved') {
		const inForce = await ProcedureRevision.findOne({
			where: { procedureId: procedure.id, shopId: shop.id, state: 'approved' },
			order: [['rev', 'DESC']]
		});
		if (inForce) {
			const live = await ensureBoothLink(shop.id, inForce.id);
			current = {
				rev: inForce.rev,
				revisionId: inForce.id,
				path: live ? boothPath(live.token) : null
			};
		}
	}
	return {
		link: { id: link.id, revoked: link.revokedAt !== null && link.revokedAt !== undefined },
		shopId: shop.id,
		shopName: shop.name,
		procedureId: procedure.id,
		number: procedure.number,
		revisionId: revision.id,
		rev: revision.rev,
		state: revision.state as RevisionStateId,
		supersededByRev: revision.supersededByRev ?? null,
		withdrawnAt: revision.withdrawnAt ?? null,
		current
	};
}
