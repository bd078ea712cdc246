// What a scanned booth link points at, live: the revision's state now, and the revision of the
// same procedure in force now (with its own link) when that is another one.
import { QueryTypes } from 'sequelize';
import type { RevisionStateId } from '$lib/procedures/options';
import { sequelize } from '../db/sequelize';
import { ProcedureRevision } from '../models';
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

interface LinkRow {
	link_id: number;
	revoked_at: unknown;
	shop_id: number;
	shop_name: string;
	procedure_id: number;
	number: string;
	revision_id: number;
	rev: number;
	state: string;
	superseded_by_rev: number | null;
	withdrawn_at: unknown;
}

// The busiest public page: the link, its revision, procedure and shop in one indexed read
// (token is unique), as a plain row. Each join is also held to the link's shop.
const LINK_SQL = `SELECT l.id AS link_id, l.revoked_at, s.id AS shop_id, s.name AS shop_name,
	p.id AS procedure_id, p.number, r.id AS revision_id, r.rev, r.state, r.superseded_by_rev,
	r.withdrawn_at
	FROM booth_links l
	JOIN procedure_revisions r ON r.id = l.revision_id AND r.shop_id = l.shop_id
	JOIN procedures p ON p.id = l.procedure_id AND p.shop_id = l.shop_id
	JOIN shops s ON s.id = l.shop_id
	WHERE l.token = ?`;

/** A plain row's date is the driver's: text on SQLite, a Date on PostgreSQL. */
const dateOf = (x: unknown): Date | null =>
	x === null || x === undefined ? null : x instanceof Date ? x : new Date(String(x));

/** Null for a malformed or unknown token; a withdrawn link resolves with `link.revoked`. */
export async function resolveBoothToken(token: string): Promise<BoothStatus | null> {
	if (!BOOTH_TOKEN.test(token)) return null;
	const [row] = await sequelize.query<LinkRow>(LINK_SQL, {
		replacements: [token],
		type: QueryTypes.SELECT
	});
	if (!row) return null;
	const shopId = Number(row.shop_id);
	const procedureId = Number(row.procedure_id);
	let current: BoothStatus['current'] = null;
	if (row.state !== 'approved') {
		const inForce = await ProcedureRevision.findOne({
			where: { procedureId, shopId, state: 'approved' },
			order: [['rev', 'DESC']]
		});
		if (inForce) {
			const live = await ensureBoothLink(shopId, inForce.id);
			current = {
				rev: inForce.rev,
				revisionId: inForce.id,
				path: live ? boothPath(live.token) : null
			};
		}
	}
	return {
		link: {
			id: Number(row.link_id),
			revoked: row.revoked_at !== null && row.revoked_at !== undefined
		},
		shopId,
		shopName: row.shop_name,
		procedureId,
		number: row.number,
		revisionId: Number(row.revision_id),
		rev: Number(row.rev),
		state: row.state as RevisionStateId,
		supersededByRev: row.superseded_by_rev == null ? null : Number(row.superseded_by_rev),
		withdrawnAt: dateOf(row.withdrawn_at),
		current
	};
}
