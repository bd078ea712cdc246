// The shop's calendar day where only its id is at hand (booth taps, reminders, continuity
// writes). One primary-key read; callers with a signed-in member use its timeZone instead.
import type { Transaction } from 'sequelize';
import { Shop } from '../models';
import { localDay } from './dates';

export async function shopTimeZone(shopId: number, t?: Transaction): Promise<string> {
	const shop = await Shop.findByPk(shopId, { attributes: ['id', 'timeZone'], transaction: t });
	return shop?.timeZone ?? 'UTC';
}

export async function shopDay(shopId: number, now = new Date(), t?: Transaction): Promise<string> {
	return localDay(now, await shopTimeZone(shopId, t));
}
