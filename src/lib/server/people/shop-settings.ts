import type { RequestEvent } from '@sveltejs/kit';
import type { z } from 'zod';
import type { shopSettingsSchema } from '$lib/schemas/account';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { Shop } from '../models';
import { actorRef, requireActiveAdmin } from './actor';
import { NotFoundError } from './errors';

export type ShopSettingsInput = z.output<typeof shopSettingsSchema>;

export async function getShopSettings(actor: SessionUser): Promise<ShopSettingsInput> {
	const shop = await Shop.findByPk(actor.shopId);
	if (!shop) throw new NotFoundError('Shop not found.');
	return { name: shop.name, unitSystem: shop.unitSystem };
}

export async function updateShopSettings(
	actor: SessionUser,
	input: ShopSettingsInput,
	event: RequestEvent | null = null
): Promise<void> {
	await write(async (t) => {
		const me = await requireActiveAdmin(actor, t);
		const shop = await Shop.findByPk(actor.shopId, { transaction: t });
		if (!shop) throw new NotFoundError('Shop not found.');
		const before = { name: shop.name, unitSystem: shop.unitSystem };
		if (before.name === input.name && before.unitSystem === input.unitSystem) return;
		await Shop.update(
			{ name: input.name, unitSystem: input.unitSystem },
			{ where: { id: actor.shopId }, transaction: t }
		);
		await audit(
			{
				shopId: actor.shopId,
				actor: actorRef(me),
				action: 'shop.settings_updated',
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
