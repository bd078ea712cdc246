// Two to four records side by side, each row marked where the values differ.
import { displayRows } from '$lib/records/display';
import type { SessionUser } from '../auth/session-user';
import { SettingsRecord, User } from '../models';
import { NotFoundError, RefusedError } from '../people/errors';
import { storedValues } from './read';

export const COMPARE_MAX = 4;

export interface CompareRow {
	key: string;
	label: string;
	values: string[];
	differs: boolean;
}

/** Ids from `?ids=1,2` or `?ids=1&ids=2`, in the order given, without repeats. */
export function compareIds(params: URLSearchParams): number[] {
	const ids = params
		.getAll('ids')
		.flatMap((v) => v.split(','))
		.map((v) => v.trim())
		.filter((v) => /^[1-9][0-9]{0,14}$/.test(v))
		.map(Number);
	return [...new Set(ids)];
}

export async function compareRecords(actor: SessionUser, ids: number[]) {
	if (ids.length < 2 || ids.length > COMPARE_MAX)
		throw new RefusedError(`Pick 2 to ${COMPARE_MAX} records to compare.`);
	const found = await SettingsRecord.findAll({ where: { id: ids, shopId: actor.shopId } });
	if (found.length !== ids.length)
		throw new NotFoundError('One of those records is not in your shop.');
	const byId = new Map(found.map((r) => [r.id, r]));
	const records = ids.map((id) => byId.get(id) as SettingsRecord);
	const authors = await User.findAll({
		where: { id: records.map((r) => r.authorId), shopId: actor.shopId },
		attributes: ['id', 'name']
	});
	const name = new Map(authors.map((a) => [a.id, a.name]));
	const columns = records.map((r) => displayRows(storedValues(r), actor.unitSystem));
	const first = columns[0] ?? [];
	const rows: CompareRow[] = first.map((row, i) => {
		const values = columns.map((c) => c[i]?.value ?? '');
		return { key: row.key, label: row.label, values, differs: new Set(values).size > 1 };
	});
	rows.push({
		key: 'cautions',
		label: 'Cautions when saved',
		values: records.map((r) => String(r.cautionCount)),
		differs: new Set(records.map((r) => r.cautionCount)).size > 1
	});
	return {
		records: records.map((r) => ({ id: r.id, author: name.get(r.authorId) ?? 'former member' })),
		rows
	};
}
