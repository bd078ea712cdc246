import type { RequestEvent } from '@sveltejs/kit';
import type { Transaction } from 'sequelize';
import type { z } from 'zod';
import type { shopSettingsSchema } from '$lib/schemas/account';
import { audit } from '../audit';
import type { SessionUser } from '../auth/session-user';
import { write } from '../db';
import { SHOP_CODES, type ShopCode } from '$lib/procedures/default-code';
import { Shop } from '../models';
import { zoneOr } from '$lib/dates/time-zone';
import { actorRef, requireActiveAdmin } from './actor';
import { NotFoundError } from './errors';

export type ShopSettings = z.output<typeof shopSettingsSchema>;
/** A caller that leaves the default code or the time zone out keeps the shop's. */
export type ShopSettingsInput = Omit<ShopSettings, 'defaultCode' | 'timeZone'> &
	Partial<Pick<ShopSettings, 'defaultCode' | 'timeZone'>>;

const shopCode = (x: string): ShopCode =>
	(SHOP_CODES as readonly string[]).includes(x) ? (x as ShopCode) : 'asme-ix';

export async function getShopSettings(actor: SessionUser): Promise<ShopSettings> {
	const shop = await Shop.findByPk(actor.shopId);
	if (!shop) throw new NotFoundError('Shop not found.');
	return {
		name: shop.name,
		unitSystem: shop.unitSystem,
		defaultCode: shopCode(shop.defaultCode),
		timeZone: zoneOr(shop.timeZone)
	};
}

/** The governing code new procedures, PQRs and qualifications of the shop start from. */
export async function shopDefaultCode(shopId: number, t?: Transaction): Promise<ShopCode> {
	const shop = await Shop.findByPk(shopId, { attributes: ['id', 'defaultCode'], transaction: t });
	return shopCode(shop?.defaultCode ?? '');
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
		const before = {
			name: shop.name,
			unitSystem: shop.unitSystem,
			defaultCode: shop.defaultCode,
			timeZone: shop.timeZone
		};
		const after = {
			...input,
			defaultCode: input.defaultCode ?? shop.defaultCode,
			timeZone: input.timeZone ?? shop.timeZone
		};
		if ((Object.keys(before) as (keyof typeof before)[]).every((k) => before[k] === after[k]))
			return;
		await Shop.update(after, { where: { id: actor.shopId }, transaction: t });
		await audit(
			{
				shopId: actor.shopId,
				actor: actorRef(me),
				action: 'shop.settings_updated',
				objectType: 'shop',
				objectId: actor.shopId,
				before,
				after
			},
			event,
			t
		);
	});
}
