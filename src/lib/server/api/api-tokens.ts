import type { RequestEvent } from '@sveltejs/kit';
import { createHash, randomBytes } from 'node:crypto';
import { Op } from 'sequelize';
import type { Role } from '$lib/roles';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db/write-queue';
import { ApiToken, Shop, User } from '../models';

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

/** The member a bearer token acts as, or null for an unknown, revoked or malformed token. */
export async function memberForToken(secret: string): Promise<SessionUser | null> {
	if (!secret.startsWith(PREFIX) || secret.length > 100) return null;
	const token = await ApiToken.findOne({
		where: { tokenHash: hashToken(secret), revokedAt: null },
		include: [Shop, { model: User, as: 'createdBy' }]
	});
	const shop = (token as (ApiToken & { Shop?: Shop }) | null)?.Shop;
	const creator = (token as (ApiToken & { createdBy?: User }) | null)?.createdBy;
	if (!token || !shop || !creator?.active) return null;
	const now = Date.now();
	if (!token.lastUsedAt || now - token.lastUsedAt.getTime() > LAST_USED_GRANULARITY_MS) {
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
		id: creator.id,
		shopId: shop.id,
		shopName: shop.name,
		name: `${token.name} (API token)`,
		email: creator.email,
		role: token.role,
		unitSystem: shop.unitSystem
	};
}
