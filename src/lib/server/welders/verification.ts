// Verification links printed as the card's QR code: /q/<token>. One live link per welder; revoking
// withdraws every card printed with it, and the next card gets a fresh link.
import type { RequestEvent } from '@sveltejs/kit';
import { randomBytes } from 'node:crypto';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { config } from '../config';
import { write } from '../db';
import { VerificationLink } from '../models';
import { actingMember, MANAGE_ROLES } from './access';
import { findWelder } from './welders';

/** 144 random bits, URL-safe: unguessable, and short enough for a small QR code. */
export const newToken = (): string => randomBytes(18).toString('base64url');
const TOKEN = /^[A-Za-z0-9_-]{24}$/;

export const verifyUrl = (token: string): string =>
	`${new URL(config.origin).origin}/q/${encodeURIComponent(token)}`;

/** The welder's live link, made now if there is none. Anyone who may print a card may call it. */
export async function liveLink(
	actor: SessionUser,
	welderId: number,
	event: RequestEvent | null = null
): Promise<{ token: string; createdAt: Date }> {
	const existing = await VerificationLink.findOne({
		where: { shopId: actor.shopId, welderId, revokedAt: null },
		order: [['id', 'DESC']]
	});
	if (existing) return { token: existing.token, createdAt: existing.createdAt };
	return write(async (t) => {
		const w = await findWelder(actor.shopId, welderId, t);
		// Re-check inside the queue: a parallel print may have made one meanwhile.
		const again = await VerificationLink.findOne({
			where: { shopId: actor.shopId, welderId: w.id, revokedAt: null },
			transaction: t
		});
		if (again) return { token: again.token, createdAt: again.createdAt };
		const link = await VerificationLink.create(
			{ shopId: actor.shopId, welderId: w.id, token: newToken(), createdById: actor.id },
			{ transaction: t }
		);
		await audit(
			{
				shopId: actor.shopId,
				actor,
				action: 'verification-link.issued',
				objectType: 'welder',
				objectId: w.id
			},
			event,
			t
		);
		return { token: link.token, createdAt: link.createdAt };
	});
}

/** Withdraws the welder's live link (every card printed with it now reads "withdrawn"). */
export async function revokeLinks(
	actor: SessionUser,
	welderId: number,
	event: RequestEvent | null = null
): Promise<number> {
	return write(async (t) => {
		const me = await actingMember(actor, MANAGE_ROLES, t);
		const w = await findWelder(actor.shopId, welderId, t);
		const [n] = await VerificationLink.update(
			{ revokedAt: new Date(), revokedById: me.id },
			{ where: { shopId: actor.shopId, welderId: w.id, revokedAt: null }, transaction: t }
		);
		if (n)
			await audit(
				{
					shopId: actor.shopId,
					actor: me,
					action: 'verification-link.revoked',
					objectType: 'welder',
					objectId: w.id,
					after: { revoked: n }
				},
				event,
				t
			);
		return n;
	});
}

export async function linkState(shopId: number, welderId: number) {
	const live = await VerificationLink.findOne({
		where: { shopId, welderId, revokedAt: null },
		order: [['id', 'DESC']]
	});
	const revoked = await VerificationLink.count({ where: { shopId, welderId } });
	return live
		? { live: true as const, since: live.createdAt, url: verifyUrl(live.token), total: revoked }
		: { live: false as const, total: revoked };
}

/** What a scanned token points at; null for a malformed or unknown token. */
export async function resolveToken(token: string) {
	if (!TOKEN.test(token)) return null;
	const link = await VerificationLink.findOne({ where: { token } });
	if (!link) return null;
	return { shopId: link.shopId, welderId: link.welderId, revokedAt: link.revokedAt ?? null };
}
