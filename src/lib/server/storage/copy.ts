// Every stored object from one back end into another (db:copy, moving a shop between a folder and
// a bucket), each verified by reading it back from the target: same size, same SHA-256.
import { createHash } from 'node:crypto';
import type { Readable } from 'node:stream';
import { readAll, type StorageBackend } from './backend';

export interface CopyResult {
	copied: number;
	/** Already in the target with the same size and SHA-256 (a re-run after an interruption). */
	skipped: number;
	bytes: number;
	/** One line per object that did not arrive intact; empty when all is well. */
	problems: string[];
}

/** Size and SHA-256 of a stream, read to the end. */
export async function digest(body: Readable): Promise<{ bytes: number; sha256: string }> {
	const hash = createHash('sha256');
	let bytes = 0;
	for await (const c of body) {
		const chunk = c as Buffer;
		hash.update(chunk);
		bytes += chunk.length;
	}
	return { bytes, sha256: hash.digest('hex') };
}

async function digestOf(store: StorageBackend, name: string) {
	const found = await store.get(name);
	return found ? digest(found.body) : null;
}

/**
 * Copies every object (uploads and whatever the sweep moved aside; not `.part` leftovers, which
 * were never acknowledged) and verifies each in the target. An object already there intact is
 * left alone, so an interrupted copy can simply be run again.
 */
export async function copyUploads(
	from: StorageBackend,
	to: StorageBackend,
	opts: { onProgress?: (done: number) => void } = {}
): Promise<CopyResult> {
	const result: CopyResult = { copied: 0, skipped: 0, bytes: 0, problems: [] };
	for await (const o of from.list()) {
		if (o.name.endsWith('.part') || o.name.startsWith('beadline-check/')) continue;
		const source = await from.get(o.name);
		if (!source) continue; // removed meanwhile
		// Uploads are bounded (10 MB photos, 20 MB reports): held once, hashed, sent, read back.
		const bytes = await readAll(source.body);
		const want = { bytes: bytes.length, sha256: createHash('sha256').update(bytes).digest('hex') };
		const existing = await digestOf(to, o.name);
		if (existing) {
			if (existing.sha256 === want.sha256 && existing.bytes === want.bytes) result.skipped++;
			else
				result.problems.push(`${o.name}: a different object of that name is already in the target`);
			continue;
		}
		await to.put(o.name, bytes);
		const got = await digestOf(to, o.name);
		if (!got) result.problems.push(`${o.name}: missing from the target after the copy`);
		else if (got.bytes !== want.bytes || got.sha256 !== want.sha256)
			result.problems.push(
				`${o.name}: ${want.bytes} bytes sent, ${got.bytes} bytes in the target, SHA-256 differs`
			);
		else {
			result.copied++;
			result.bytes += got.bytes;
		}
		opts.onProgress?.(result.copied + result.skipped);
	}
	return result;
}
