// Row locks for the places where two writers in different processes could both read "free" and
// both write (PostgreSQL). `lock: t.LOCK.UPDATE` is SELECT … FOR UPDATE there; Sequelize leaves
// it out on SQLite, whose one-writer queue already runs write transactions one at a time.
import type { Transaction } from 'sequelize';
import { Shop } from '../models';

/**
 * Holds the shop's row until `t` ends: what is unique per shop only case-insensitively (procedure
 * and PQR numbers) is checked and written by one transaction at a time.
 */
export async function lockShop(shopId: number, t: Transaction): Promise<void> {
	await Shop.findByPk(shopId, { attributes: ['id'], lock: t.LOCK.UPDATE, transaction: t });
}
