// The audit trail of procedures and PQRs: per object, and shop-wide for admins with filters and a
// CSV export. Events are append-only; before and after are shown as the paths that changed, raw,
// and beside them in the shop's words (`words`, from $lib/audit). The export stays raw.
import { Op, type WhereOptions } from 'sequelize';
import { describeEvent, type EventInWords, type Reading } from '$lib/audit/describe-event';
import { likeOp } from '../db/dialect';
import { sequelize } from '../db/sequelize';
import type { SessionUser } from '../auth/session-user';
import { AuditEvent, ProcedureRevision, RevisionRecord } from '../models';

export interface TrailEntry {
	id: number;
	at: string;
	actor: string;
	action: string;
	objectType: string;
	objectId: string | null;
	changes: { path: string; before: string; after: string }[];
	ip: string | null;
	/** The same event as a sentence, labels, the reader's units and a named time zone. */
	words: EventInWords;
}

/**
 * How the reader sees values: their unit system, and moments on the shop's clock with the zone
 * named ("23:02 America/Chicago"); the exact instant stays in the page's <time datetime> and the
 * raw view, and the CSV/JSON export keeps UTC.
 */
const readingOf = (actor: SessionUser): Reading => ({
	system: actor.unitSystem,
	timeZone: actor.timeZone
});

const parse = (s: string | null): unknown => {
	if (s === null) return undefined;
	try {
		return JSON.parse(s);
	} catch {
		return s;
	}
};

/** Leaf values of a JSON value by dotted path; arrays of scalars stay one leaf. */
export function flatten(
	v: unknown,
	prefix = '',
	out: Record<string, string> = {}
): Record<string, string> {
	if (v === undefined) return out;
	if (
		v !== null &&
		typeof v === 'object' &&
		!(Array.isArray(v) && v.every((x) => typeof x !== 'object'))
	) {
		for (const [k, x] of Object.entries(v as Record<string, unknown>))
			flatten(x, prefix ? `${prefix}.${k}` : k, out);
		return out;
	}
	out[prefix || 'value'] = Array.isArray(v) ? v.join(', ') : v === null ? '' : String(v);
	return out;
}

/** The paths whose values differ between before and after (all of after for a creation). */
export function changesOf(before: unknown, after: unknown) {
	const a = flatten(before);
	const b = flatten(after);
	return [...new Set([...Object.keys(a), ...Object.keys(b)])]
		.filter((k) => (a[k] ?? '') !== (b[k] ?? ''))
		.map((path) => ({ path, before: a[path] ?? '', after: b[path] ?? '' }));
}

const entryFor =
	(reading: Reading) =>
	(e: AuditEvent): TrailEntry => {
		const [before, after] = [parse(e.before), parse(e.after)];
		return {
			id: e.id,
			at: e.at.toISOString(),
			actor: e.actorName,
			action: e.action,
			objectType: e.objectType,
			objectId: e.objectId,
			changes: changesOf(before, after),
			ip: e.ip,
			words: describeEvent(
				{ actor: e.actorName, action: e.action, at: e.at, before, after },
				reading
			)
		};
	};

/** A procedure's own events, its revisions', and the freezing of the records it cites. */
export async function procedureTrail(
	actor: SessionUser,
	procedureId: number
): Promise<TrailEntry[]> {
	const revs = await ProcedureRevision.findAll({
		where: { procedureId, shopId: actor.shopId },
		attributes: ['id']
	});
	const cited = await RevisionRecord.findAll({
		where: { shopId: actor.shopId, revisionId: { [Op.in]: revs.map((r) => r.id) } },
		attributes: ['recordId']
	});
	const events = await AuditEvent.findAll({
		where: {
			shopId: actor.shopId,
			[Op.or]: [
				{ objectType: 'procedure', objectId: String(procedureId) },
				{ objectType: 'procedure_revision', objectId: { [Op.in]: revs.map((r) => String(r.id)) } },
				{
					objectType: 'settings_record',
					action: 'settings_record.frozen',
					objectId: { [Op.in]: cited.map((c) => String(c.recordId)) }
				}
			]
		},
		order: [['id', 'ASC']],
		limit: 1000
	});
	return events.map(entryFor(readingOf(actor)));
}

export async function objectTrail(actor: SessionUser, objectType: string, objectId: number) {
	const events = await AuditEvent.findAll({
		where: { shopId: actor.shopId, objectType, objectId: String(objectId) },
		order: [['id', 'ASC']],
		limit: 1000
	});
	return events.map(entryFor(readingOf(actor)));
}

export interface TrailFilters {
	type?: string;
	action?: string;
	actor?: string;
	object?: string;
	from?: string;
	to?: string;
	page: number;
}

export const TRAIL_PAGE = 100;

function whereOf(actor: SessionUser, f: TrailFilters): WhereOptions<AuditEvent> {
	const and: WhereOptions<AuditEvent>[] = [{ shopId: actor.shopId }];
	if (f.type) and.push({ objectType: f.type });
	if (f.action) and.push({ action: { [likeOp(sequelize)]: `%${f.action.replace(/%/g, '')}%` } });
	if (f.actor) and.push({ actorName: { [likeOp(sequelize)]: `%${f.actor.replace(/%/g, '')}%` } });
	if (f.object) and.push({ objectId: f.object });
	if (f.from) and.push({ at: { [Op.gte]: new Date(`${f.from}T00:00:00Z`) } });
	if (f.to)
		and.push({ at: { [Op.lt]: new Date(new Date(`${f.to}T00:00:00Z`).getTime() + 86_400_000) } });
	return { [Op.and]: and };
}

export async function shopTrail(actor: SessionUser, f: TrailFilters) {
	const { rows, count } = await AuditEvent.findAndCountAll({
		where: whereOf(actor, f),
		order: [['id', 'DESC']],
		limit: TRAIL_PAGE,
		offset: (f.page - 1) * TRAIL_PAGE
	});
	const types = await AuditEvent.findAll({
		where: { shopId: actor.shopId },
		attributes: ['objectType'],
		group: ['objectType'],
		order: [['objectType', 'ASC']]
	});
	return {
		rows: rows.map(entryFor(readingOf(actor))),
		total: count,
		pages: Math.max(1, Math.ceil(count / TRAIL_PAGE)),
		types: types.map((t) => t.objectType)
	};
}

/** A spreadsheet cell: quoted, and never read as a formula. */
export function csvCell(v: string | null | undefined): string {
	let s = v ?? '';
	if (/^[=+\-@\t\r]/.test(s)) s = `'${s}`;
	return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export const CSV_MAX_ROWS = 50_000;

export async function shopTrailCsv(actor: SessionUser, f: TrailFilters): Promise<string> {
	const rows = await AuditEvent.findAll({
		where: whereOf(actor, f),
		order: [['id', 'ASC']],
		limit: CSV_MAX_ROWS
	});
	const head = [
		'id',
		'at_utc',
		'actor',
		'action',
		'object_type',
		'object_id',
		'before',
		'after',
		'ip'
	];
	const lines = rows.map((e) =>
		[
			String(e.id),
			e.at.toISOString(),
			e.actorName,
			e.action,
			e.objectType,
			e.objectId,
			e.before,
			e.after,
			e.ip
		]
			.map(csvCell)
			.join(',')
	);
	return [head.join(','), ...lines].join('\r\n') + '\r\n';
}
