// The one interface every upload goes through, whatever holds the bytes: a local folder
// (local.ts, the default) or an S3-compatible bucket (s3.ts, STORAGE=s3). Objects are named by
// their path in the storage tree: `ab/ab12…ef.jpg` for an upload, `orphaned/<stamp>/…` for what
// the start-up sweep moved aside. Both back ends use the same names, so copying between them,
// backing up and restoring keep one layout.
import type { Readable } from 'node:stream';

export interface StoredObject {
	/** The object's name in the tree, `/`-separated. */
	name: string;
	bytes: number;
	modified: Date;
}

export interface StorageBackend {
	/** `local` or `s3`, for messages. */
	readonly kind: 'local' | 's3';
	/** Where the objects are, for people: a folder or `s3://bucket/`. */
	readonly where: string;
	/** Stores the whole object or nothing: a reader never sees it half written. */
	put(name: string, body: Uint8Array | Readable): Promise<void>;
	/** The object as a stream with its size, or null when there is no such object. */
	get(name: string): Promise<{ body: Readable; bytes: number } | null>;
	exists(name: string): Promise<boolean>;
	/** Removes the object; an object already gone is not an error. */
	delete(name: string): Promise<void>;
	/** Every object whose name starts with `prefix` (all when empty), in no promised order. */
	list(prefix?: string): AsyncIterable<StoredObject>;
	/** Proves the store can be reached and written; throws ConfigError naming the variable. */
	check(): Promise<void>;
	/** Lets go of connections (scripts and tests end cleanly). */
	close(): Promise<void>;
}

/** The storage keys saveUpload hands out: random hex, a kind, an optional thumbnail mark. */
export const KEY = /^[0-9a-f]{32}(-t)?\.(jpg|png|pdf)$/;

/** Where a key lives in the tree: sharded by its first two characters. */
export function objectName(key: string): string {
	if (!KEY.test(key)) throw new Error('Not a storage key');
	return `${key.slice(0, 2)}/${key}`;
}

/** The key of an object name in the shard tree, or null for anything else (e.g. orphaned/). */
export function keyOfName(name: string): string | null {
	const m = /^([0-9a-f]{2})\/([^/]+)$/.exec(name);
	return m && KEY.test(m[2]!) && m[2]!.startsWith(m[1]!) ? m[2]! : null;
}

const SEGMENT = /^[A-Za-z0-9][A-Za-z0-9._-]*$/;

/** Names are ours; a name with `..`, a leading `/` or odd characters never reaches a store. */
export function assertName(name: string): void {
	if (!name.split('/').every((s) => SEGMENT.test(s) && s !== '..'))
		throw new Error(`Not a storage object name: ${JSON.stringify(name).slice(0, 80)}`);
}

/** Reads a stream to the end (downloads small enough to hold: photos, reports). */
export async function readAll(body: Readable): Promise<Buffer> {
	const chunks: Buffer[] = [];
	for await (const c of body) chunks.push(Buffer.isBuffer(c) ? c : Buffer.from(c as Uint8Array));
	return Buffer.concat(chunks);
}
