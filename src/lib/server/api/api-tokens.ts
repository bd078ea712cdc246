import { zoneOr } from '$lib/dates/time-zone';
import type { RequestEvent } from '@sveltejs/kit';
import { createHash, randomBytes } from 'node:crypto';
import { Op, QueryTypes } from 'sequelize';
import type { Role } from '$lib/roles';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { sequelize } from '../db/sequelize';
import { write } from '../db/write-queue';
import { ApiToken, User } from '../models';

const PREFIX = 'bl_';
/** Writing last-used on every call would make each read a write; once a minute is plenty. */
const LAST_USED_GRANULARITY_MS = 60_000;

export function hashToken(secret: string): string {
	return createHash('sha256').update(secret).digest('hex');
}

export interface NewToken {
	id: number;
	secret: string;
}

export async function createApiToken(
	admin: SessionUser,
	input: { name: string; role: Exclude<Role, 'admin'> },
	event: RequestEvent | null
): Promise<NewToken> {
	const secret = PREFIX + randomBytes(32).toString('base64url');
	return write(async (t) => {
		const token = await ApiToken.create(
			{
				shopId: admin.shopId,
				name: input.name,
				role: input.role,
				tokenHash: hashToken(secret),
				prefix: secret.slice(0, 9),
				createdById: admin.id
			},
			{ transaction: t }
		);
		await audit(
			{
				shopId: admin.shopId,
				actor: admin,
				action: 'api-token.created',
				objectType: 'api-token',
				objectId: token.id,
				after: { name: input.name, role: input.role, prefix: token.prefix }
			},
			event,
			t
		);
		return { id: token.id, secret };
	});
}

export async function revokeApiToken(
	admin: SessionUser,
	id: number,
	event: RequestEvent | null
): Promise<boolean> {
	return write(async (t) => {
		const [count] = await ApiToken.update(
			{ revokedAt: new Date() },
			{ where: { id, shopId: admin.shopId, revokedAt: null }, transaction: t }
		);
		if (count === 1) {
			await audit(
				{
					shopId: admin.shopId,
					actor: admin,
					action: 'api-token.revoked',
					objectType: 'api-token',
					objectId: id,
					before: { revokedAt: null },
					after: { revokedAt: new Date().toISOString() }
				},
				event,
				t
			);
		}
		return count === 1;
	});
}

export function listApiTokens(shopId: number) {
	return ApiToken.findAll({
		where: { shopId },
		include: [{ model: User, as: 'createdBy', attributes: ['name'] }],
		order: [['createdAt', 'DESC']]
	});
}

interface TokenRow {
	id: number;
	name: string;
	role: Exclude<Role, 'admin'>;
	last_used_at: string | Date | null;
	shop_id: number;
	shop_name: string;
	unit_system: SessionUser['unitSystem'];
	time_zone: string;
	user_id: string;
	email: string;
	active: boolean | number;
}

// One indexed lookup (token_hash is unique) with its shop and creator, as plain rows: this runs
// on every API call, and nothing here is saved back through a model.
const TOKEN_SQL = `SELECT t.id, t.name, t.role, t.last_used_at, s.id AS shop_id,
	s.name AS shop_name, s.unit_system, s.time_zone, u.id AS user_id, u.email, u.active
	FROM api_tokens t JOIN shops s ON s.id = t.shop_id JOIN users u ON u.id = t.created_by_id
	WHERE t.token_hash = ? AND t.revoked_at IS NULL`;

/** The member a bearer token acts as, or null for an unknown, revoked or malformed token. */
export async function memberForToken(secret: string): Promise<SessionUser | null> {
	if (!secret.startsWith(PREFIX) || secret.length > 100) return null;
	const [token] = await sequelize.query<TokenRow>(TOKEN_SQL, {
		replacements: [hashToken(secret)],
		type: QueryTypes.SELECT
	});
	if (!token || !token.active) return null;
	const now = Date.now();
	const lastUsed = token.last_used_at ? new Date(token.last_used_at).getTime() : 0;
	if (now - lastUsed > LAST_USED_GRANULARITY_MS) {
		await write((t) =>
			ApiToken.update(
				{ lastUsedAt: new Date(now) },
				{
					where: {
						id: token.id,
						[Op.or]: [
							{ lastUsedAt: null },
							{ lastUsedAt: { [Op.lt]: new Date(now - LAST_USED_GRANULARITY_MS) } }
						]
					},
					transaction: t
				}
			)
		);
	}
	return {
		id: token.user_id,
		shopId: Number(token.shop_id),
		shopName: token.shop_name,
		name: `${token.name} (API token)`,
		email: token.email,
		role: token.role,
		unitSystem: token.unit_system,
		timeZone: zoneOr(token.time_zone)
	};
}
