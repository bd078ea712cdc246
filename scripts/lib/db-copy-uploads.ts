// The uploads half of db:copy: photos and lab reports move with the database, between any two
// storage back ends (src/lib/server/storage/copy.ts: each object verified by size and SHA-256 in
// the target). A back end is named by a folder path or by `s3` (the bucket of STORAGE_S3_* / the
// S3 variables in the environment, as the app itself reads them).
import { resolve } from 'node:path';
import type { StorageBackend } from '../../src/lib/server/storage/backend';
import { copyUploads as copyObjects } from '../../src/lib/server/storage/copy';
import { LocalStorage } from '../../src/lib/server/storage/local';

export interface UploadsCopy {
	files: number;
	bytes: number;
	/** Why nothing was copied, when nothing was. */
	skipped?: string;
	/** Objects that did not arrive intact (a failed verification). */
	problems: string[];
}

async function backendOf(spec: string): Promise<StorageBackend> {
	if (spec === 's3') {
		const { s3FromEnv } = await import('../../src/lib/server/storage/s3');
		return s3FromEnv();
	}
	return new LocalStorage(resolve(spec));
}

/** Copies every upload of `from` into `to` (a folder or `s3`); one already there intact is kept. */
export async function copyUploads(from?: string, to?: string): Promise<UploadsCopy> {
	const none = (skipped: string): UploadsCopy => ({ files: 0, bytes: 0, skipped, problems: [] });
	if (!from || !to) return none('no --uploads-from and --uploads-to given');
	if (from !== 's3' && to !== 's3' && resolve(from) === resolve(to)) return none('same folder');
	const r = await copyObjects(await backendOf(from), await backendOf(to));
	return { files: r.copied + r.skipped, bytes: r.bytes, problems: r.problems };
}
