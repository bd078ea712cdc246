// Lists of booth links: a procedure's signed revisions with their links for the admin's page,
// and the shop's revisions in force with their booth views for the welder's start page.
import { Op } from 'sequelize';
import type { RevisionStateId } from '$lib/procedures/options';
import type { SessionUser } from '../auth/session-user';
import { BoothLink, Procedure, ProcedureRevision } from '../models';
import { NotFoundError } from '../people/errors';
import { readVariables } from '../procedures/find';
import { boothPath, boothUrl, ensureBoothLink } from './links';
import { lookupCounts } from './lookups';

export interface RevisionLinks {
	revisionId: number;
	rev: number;
	state: RevisionStateId;
	live: {
		url: string;
		path: string;
		issuedAt: string;
		lookups: number;
		lastLookup: string | null;
	} | null;
	withdrawn: number;
}

const SIGNED = ['approved', 'superseded', 'withdrawn'];

export async function linksOfProcedure(
	actor: SessionUser,
	procedureId: number
): Promise<{
	procedure: { id: number; number: string; title: string };
	revisions: RevisionLinks[];
}> {
	const procedure = await Procedure.findOne({ where: { id: procedureId, shopId: actor.shopId } });
	if (!procedure) throw new NotFoundError('No such procedure in your shop.');
	const revisions = await ProcedureRevision.findAll({
		where: { procedureId, shopId: actor.shopId, state: { [Op.in]: SIGNED } },
		order: [['rev', 'DESC']]
	});
	const links = revisions.length
		? await BoothLink.findAll({
				where: { shopId: actor.shopId, revisionId: { [Op.in]: revisions.map((r) => r.id) } },
				order: [['id', 'DESC']]
			})
		: [];
	const counts = await lookupCounts(
		actor.shopId,
		links.map((l) => l.id)
	);
	return {
		procedure: { id: procedure.id, number: procedure.number, title: procedure.title },
		revisions: revisions.map((r) => {
			const mine = links.filter((l) => l.revisionId === r.id);
			const live = mine.find((l) => !l.revokedAt);
			const c = live ? counts.get(live.id) : undefined;
			return {
				revisionId: r.id,
				rev: r.rev,
				state: r.state as RevisionStateId,
				live: live
					? {
							url: boothUrl(live.token),
							path: boothPath(live.token),
							issuedAt: live.issuedAt.toISOString(),
							lookups: c?.count ?? 0,
							lastLookup: c?.last ? c.last.toISOString() : null
						}
					: null,
				withdrawn: mine.filter((l) => l.revokedAt).length
			};
		})
	};
}

/** The revisions in force, by procedure number, each with its booth view (issued if missing). */
export async function currentBoothLinks(
	shopId: number
): Promise<{ procedureId: number; number: string; title: string; rev: number; path: string }[]> {
	const revisions = await ProcedureRevision.findAll({ where: { shopId, state: 'approved' } });
	if (!revisions.length) return [];
	const procedures = await Procedure.findAll({
		where: { shopId, id: { [Op.in]: revisions.map((r) => r.procedureId) } }
	});
	const out = [];
	for (const r of revisions) {
		const p = procedures.find((x) => x.id === r.procedureId);
		const link = p ? await ensureBoothLink(shopId, r.id) : null;
		if (p && link)
			out.push({
				procedureId: p.id,
				number: p.number,
				title: readVariables(r).variables.title,
				rev: r.rev,
				path: boothPath(link.token)
			});
	}
	return out.sort((a, b) => a.number.localeCompare(b.number, 'en', { numeric: true }));
}
