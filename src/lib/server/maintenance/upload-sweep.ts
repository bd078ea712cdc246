// Crash recovery for uploads, run once at server start. An upload is written (temp name, then
// renamed) before the transaction that names it commits; a process killed in between leaves a
// `.part` file or a complete file no row refers to. Neither was ever acknowledged to anyone.
// Nothing is deleted: such files move to UPLOADS_DIR/orphaned/, out of the storage tree.
import { mkdir, readdir, rename, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { QueryTypes } from 'sequelize';
import { config } from '../config';
import { keyColumns } from '../db/dialect';
import { sequelize } from '../db/sequelize';

/** The storage keys of src/lib/server/storage, and their temporary names while being written. */
const KEY = /^[0-9a-f]{32}(-t)?\.(jpg|png|pdf)$/;
const PART = /^[0-9a-f]{32}(-t)?\.(jpg|png|pdf)\.[0-9a-f]+\.part$/;
const SHARD = /^[0-9a-f]{2}$/;
export const ORPHANED_DIR = 'orphaned';

/** Every storage key the database names: any `*_key` column, the convention storage keys use. */
export async function referencedKeys(): Promise<Set<string>> {
	const cols = await keyColumns(sequelize);
	const keys = new Set<string>();
	for (const { t, c } of cols) {
		const rows = await sequelize.query<{ k: unknown }>(
			`SELECT "${c}" AS k FROM "${t}" WHERE "${c}" IS NOT NULL`,
			{ type: QueryTypes.SELECT }
		);
		for (const { k } of rows) if (typeof k === 'string' && KEY.test(k)) keys.add(k);
	}
	return keys;
}

export interface SweepResult {
	partial: string[];
	orphaned: string[];
}

/**
 * Moves aside the `.part` files and unreferenced uploads older than `before` (the process start:
 * anything newer may belong to a write in progress in this very process).
 */
export async function sweepUploads(before: Date): Promise<SweepResult> {
	const root = config.uploadsDir;
	const result: SweepResult = { partial: [], orphaned: [] };
	let shards: string[];
	try {
		shards = (await readdir(root)).filter((d) => SHARD.test(d));
	} catch {
		return result; // no uploads yet
	}
	const keys = await referencedKeys();
	const aside = join(root, ORPHANED_DIR, before.toISOString().replace(/[:.]/g, '-'));
	for (const shard of shards) {
		for (const name of await readdir(join(root, shard))) {
			const kind = PART.test(name)
				? 'partial'
				: KEY.test(name) && !keys.has(name)
					? 'orphaned'
					: null;
			if (!kind) continue;
			const path = join(root, shard, name);
			if ((await stat(path)).mtime >= before) continue;
			await mkdir(aside, { recursive: true });
			await rename(path, join(aside, name));
			result[kind].push(name);
		}
	}
	if (result.partial.length || result.orphaned.length)
		console.warn(
			`[uploads] moved ${result.partial.length} unfinished and ${result.orphaned.length} unreferenced files to ${aside}`
		);
	return result;
}
