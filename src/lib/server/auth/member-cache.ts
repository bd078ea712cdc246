// The member behind a session, cached briefly per process but never trusted without asking the
// database: every request reads one row by primary key (users joined to its shop) holding what
// decides access — active, role, session version — and both rows' updated_at. If any of it
// differs from the cached copy, the member is read again. Several server processes on one
// database stay right, because the check is the database's answer, not a process's memory.
import { zoneOr } from '$lib/dates/time-zone';
import { QueryTypes } from 'sequelize';
import type { Role } from '$lib/roles';
import { sequelize } from '../db/sequelize';
import type { UnitSystem } from '../models/shop';
import type { SessionUser } from './session-user';

interface Stamp {
	active: boolean;
	role: string;
	sessionVersion: number;
	userAt: string;
	shopAt: string;
}

interface Row {
	active: boolean | number;
	role: string;
	session_version: number;
	user_at: unknown;
	shop_at: unknown;
}

interface FullRow extends Row {
	id: string;
	name: string;
	email: string;
	unit_system: UnitSystem | null;
	shop_id: number;
	shop_name: string;
	shop_unit_system: UnitSystem;
	shop_time_zone: string;
}

/** Entries live this long at most, so a process never holds a member it has not checked lately. */
const TTL_MS = 60_000;
const MAX_MEMBERS = 2_000;
const cache = new Map<string, { stamp: Stamp; member: SessionUser; at: number }>();

const stampOf = (r: Row): Stamp => ({
	active: Boolean(r.active),
	role: r.role,
	sessionVersion: Number(r.session_version),
	// SQLite gives text, PostgreSQL a Date: either way the same text for the same value.
	userAt: r.user_at instanceof Date ? r.user_at.toISOString() : String(r.user_at),
	shopAt: r.shop_at instanceof Date ? r.shop_at.toISOString() : String(r.shop_at)
});

const sameStamp = (a: Stamp, b: Stamp) =>
	a.active === b.active &&
	a.role === b.role &&
	a.sessionVersion === b.sessionVersion &&
	a.userAt === b.userAt &&
	a.shopAt === b.shopAt;

const STAMP_SQL = `SELECT u.active, u.role, u.session_version, u.updated_at AS user_at,
	s.updated_at AS shop_at FROM users u JOIN shops s ON s.id = u.shop_id WHERE u.id = ?`;

const FULL_SQL = `SELECT u.id, u.name, u.email, u.unit_system, u.active, u.role, u.session_version,
	u.updated_at AS user_at, s.id AS shop_id, s.name AS shop_name,
	s.unit_system AS shop_unit_system, s.time_zone AS shop_time_zone, s.updated_at AS shop_at
	FROM users u JOIN shops s ON s.id = u.shop_id WHERE u.id = ?`;

async function one<T extends object>(sql: string, id: string): Promise<T | undefined> {
	const rows = await sequelize.query<T>(sql, { replacements: [id], type: QueryTypes.SELECT });
	return rows[0];
}

/** How the database stands for this member now, or null when the member is gone or may not act. */
async function load(id: string, sv: number): Promise<{ stamp: Stamp; member: SessionUser } | null> {
	const r = await one<FullRow>(FULL_SQL, id);
	if (!r) return null;
	const stamp = stampOf(r);
	const member: SessionUser = {
		id: r.id,
		shopId: Number(r.shop_id),
		shopName: r.shop_name,
		name: r.name,
		email: r.email,
		role: r.role as Role,
		unitSystem: r.unit_system ?? r.shop_unit_system,
		timeZone: zoneOr(r.shop_time_zone)
	};
	return stamp.active && stamp.sessionVersion === sv ? { stamp, member } : null;
}

/**
 * The member a session names, or null when that member is disabled, gone, or has signed out
 * everywhere since the token was made (its version `sv` is older than the member's).
 */
export async function memberFor(id: string, sv: number): Promise<SessionUser | null> {
	const hit = cache.get(id);
	if (hit && Date.now() - hit.at < TTL_MS) {
		const now = await one<Row>(STAMP_SQL, id);
		if (!now) return forget(id);
		const stamp = stampOf(now);
		if (!stamp.active || stamp.sessionVersion !== sv) return null;
		if (sameStamp(stamp, hit.stamp)) return hit.member;
	}
	const fresh = await load(id, sv);
	if (!fresh) return forget(id);
	if (cache.size >= MAX_MEMBERS && !cache.has(id)) cache.delete(cache.keys().next().value!);
	cache.set(id, { ...fresh, at: Date.now() });
	return fresh.member;
}

function forget(id: string): null {
	cache.delete(id);
	return null;
}
