// The records list's filter choices (the shop's fillers in use, its people for the author
// filter), cached per shop and keyed by versions read from the database on each use: the
// records' version row that migration 0009's triggers bump on every write, and the shop's people
// (count and latest updated_at). A write from any process changes the key, so the next list in
// every process reads the choices again; nothing relies on a process having seen the write.
import { Op, QueryTypes } from 'sequelize';
import { sequelize } from '../db/sequelize';
import { SettingsRecord, User } from '../models';

const MAX_SHOPS = 500;

function cached<T>(load: (shopId: number) => Promise<T>) {
	const entries = new Map<number, { key: string; value: T }>();
	return async (shopId: number, key: string): Promise<T> => {
		const hit = entries.get(shopId);
		if (hit?.key === key) return hit.value;
		const value = await load(shopId);
		if (entries.size >= MAX_SHOPS && !hit) entries.delete(entries.keys().next().value!);
		entries.set(shopId, { key, value });
		return value;
	};
}

/** The shop's records version: migration 0009's triggers bump it on every write to them. */
export async function recordsVersion(shopId: number): Promise<string> {
	const [row] = await sequelize.query<{ version: number }>(
		'SELECT version FROM settings_record_versions WHERE shop_id = ?',
		{ replacements: [shopId], type: QueryTypes.SELECT }
	);
	return String(row?.version ?? 0);
}

async function peopleVersion(shopId: number): Promise<string> {
	const [row] = await sequelize.query<{ n: number; at: unknown }>(
		'SELECT count(*) AS n, max(updated_at) AS at FROM users WHERE shop_id = ?',
		{ replacements: [shopId], type: QueryTypes.SELECT }
	);
	const at = row?.at instanceof Date ? row.at.toISOString() : String(row?.at);
	return `${row?.n ?? 0}/${at}`;
}

const fillers = cached(async (shopId) => {
	const rows = await SettingsRecord.findAll({
		where: { shopId, fillerClass: { [Op.ne]: null } },
		attributes: ['fillerClass'],
		group: ['fillerClass'],
		order: [['fillerClass', 'ASC']],
		limit: 200,
		raw: true
	});
	return rows.map((r) => r.fillerClass).filter((x): x is string => !!x);
});

const people = cached(async (shopId) => {
	const rows = await User.findAll({
		where: { shopId },
		attributes: ['id', 'name'],
		order: [['name', 'ASC']],
		raw: true
	});
	return rows.map((p) => [p.id, p.name] as [string, string]);
});

/** The shop's fillers in use, for the filter's choices. */
export async function fillersInUse(shopId: number): Promise<string[]> {
	return fillers(shopId, await recordsVersion(shopId));
}

/** Names of the shop's people, for the author column and the author filter. */
export async function authorNames(shopId: number): Promise<Map<string, string>> {
	return new Map(await people(shopId, await peopleVersion(shopId)));
}
