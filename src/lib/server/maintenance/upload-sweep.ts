// Crash recovery for uploads, run once at server start. An upload is written (temp name, then
// renamed) before the transaction that names it commits; a process killed in between leaves a
// `.part` file or a complete file no row refers to. Neither was ever acknowledged to anyone.
// Nothing is deleted: such files move to orphaned/<start>/ (UPLOADS_DIR/orphaned/ or the bucket's
// orphaned/ prefix), out of the storage tree. Goes through the storage interface, never sharp.
import { QueryTypes } from 'sequelize';
import { keyColumns } from '../db/dialect';
import { sequelize } from '../db/sequelize';
import type { StorageBackend } from '../storage/backend';
import { storage } from '../storage/select';

/** The storage keys of src/lib/server/storage, and their temporary names while being written. */
const KEY = /^[0-9a-f]{32}(-t)?\.(jpg|png|pdf)$/;
const PART = /^[0-9a-f]{32}(-t)?\.(jpg|png|pdf)\.[0-9a-f]+\.part$/;
const IN_TREE = /^([0-9a-f]{2})\/([^/]+)$/;
/**
 * A bucket is shared by every process: an object another, running process wrote a moment before
 * this one started may be waiting for its row to commit. Only what is this much older is moved.
 */
const SHARED_GRACE_MS = 15 * 60_000;
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
export async function sweepUploads(before: Date, store?: StorageBackend): Promise<SweepResult> {
	const backend = store ?? (await storage());
	const cutoff =
		backend.kind === 's3' ? new Date(before.getTime() - SHARED_GRACE_MS).getTime() : +before;
	const result: SweepResult = { partial: [], orphaned: [] };
	const candidates: { name: string; base: string; kind: keyof SweepResult }[] = [];
	for await (const o of backend.list()) {
		const m = IN_TREE.exec(o.name);
		if (!m || !m[2]!.startsWith(m[1]!) || o.modified.getTime() >= cutoff) continue;
		const base = m[2]!;
		if (PART.test(base)) candidates.push({ name: o.name, base, kind: 'partial' });
		else if (KEY.test(base)) candidates.push({ name: o.name, base, kind: 'orphaned' });
	}
	if (!candidates.length) return result;
	const keys = await referencedKeys();
	const aside = `${ORPHANED_DIR}/${before.toISOString().replace(/[:.]/g, '-')}`;
	for (const c of candidates) {
		if (c.kind === 'orphaned' && keys.has(c.base)) continue;
		const found = await backend.get(c.name);
		if (!found) continue; // gone meanwhile
		// Copy first, delete second: a crash in between leaves two copies, never none.
		await backend.put(`${aside}/${c.base}`, found.body);
		await backend.delete(c.name);
		result[c.kind].push(c.base);
	}
	if (result.partial.length || result.orphaned.length)
		console.warn(
			`[uploads] moved ${result.partial.length} unfinished and ${result.orphaned.length} unreferenced files to ${backend.where}/${aside}`
		);
	return result;
}
