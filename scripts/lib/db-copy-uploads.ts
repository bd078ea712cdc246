// The uploads half of db:copy: photos and lab reports move with the database when the two
// installations keep them in different places.
//
// TODO(issue 12, item 4): when the storage back ends (local folder, S3) are on main, copy through
// their exported "copy every upload between back ends" function here, so --uploads-from and
// --uploads-to can name a bucket too. Until then both are local folders.
import { cp, readdir, stat } from 'node:fs/promises';
import { join, resolve } from 'node:path';

export interface UploadsCopy {
	files: number;
	bytes: number;
	/** Why nothing was copied, when nothing was. */
	skipped?: string;
}

async function tally(dir: string): Promise<{ files: number; bytes: number }> {
	let files = 0;
	let bytes = 0;
	for (const e of await readdir(dir, { withFileTypes: true, recursive: true })) {
		if (!e.isFile()) continue;
		files++;
		bytes += (await stat(join(e.parentPath, e.name))).size;
	}
	return { files, bytes };
}

/** Copies every upload under `from` into `to`, never overwriting a file already there. */
export async function copyUploads(from?: string, to?: string): Promise<UploadsCopy> {
	if (!from || !to)
		return { files: 0, bytes: 0, skipped: 'no --uploads-from and --uploads-to given' };
	if (resolve(from) === resolve(to)) return { files: 0, bytes: 0, skipped: 'same folder' };
	try {
		await stat(from);
	} catch {
		return { files: 0, bytes: 0, skipped: `${from} does not exist (no uploads yet)` };
	}
	await cp(from, to, {
		recursive: true,
		force: false,
		errorOnExist: false,
		preserveTimestamps: true
	});
	return tally(from);
}
