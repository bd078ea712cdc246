// The data book's ZIP, streamed with archiver as the response reads it: one entry at a time, an
// uploaded report piped from the store (never read whole into memory), manifest.json last. A
// stored file whose bytes no longer hash to what the manifest says fails the download instead of
// handing the customer a ZIP whose manifest lies.
import { ZipArchive } from 'archiver';
import { createHash } from 'node:crypto';
import { Transform, type Readable } from 'node:stream';
import { MANIFEST_NAME } from './manifest';

export type ZipEntry =
	| { name: string; bytes: Uint8Array }
	| { name: string; sha256: string; open: () => Promise<Readable> };

/** Passes bytes through and fails at the end when their SHA-256 is not `expected`. */
function checked(name: string, expected: string): Transform {
	const hash = createHash('sha256');
	return new Transform({
		transform(chunk: Buffer, _enc, done) {
			hash.update(chunk);
			done(null, chunk);
		},
		flush(done) {
			const got = hash.digest('hex');
			done(got === expected ? null : new Error(`${name} changed while the data book was made.`));
		}
	});
}

/** Resolves when the archive has written its current entry; rejects when it was closed first. */
function entryWritten(archive: ZipArchive): Promise<void> {
	return new Promise((resolve, reject) => {
		const done = () => {
			archive.off('close', gone);
			resolve();
		};
		const gone = () => {
			archive.off('entry', done);
			reject(new Error('The download ended before the data book was written.'));
		};
		archive.once('entry', done);
		archive.once('close', gone);
	});
}

/** The ZIP as a stream; `date` stamps every entry (the compile time). */
export function zipStream(entries: ZipEntry[], manifest: string, date: Date): Readable {
	const archive = new ZipArchive({ zlib: { level: 6 } });
	let open: Readable | null = null;
	const add = async () => {
		for (const e of entries) {
			let source: Buffer | Readable;
			if ('bytes' in e) source = Buffer.from(e.bytes.buffer, e.bytes.byteOffset, e.bytes.length);
			else {
				const raw = (open = await e.open());
				const check = checked(e.name, e.sha256);
				raw.on('error', (err) => check.destroy(err));
				// A failed source ends the whole download (archiver would wait for it forever).
				check.on('error', (err) => archive.destroy(err));
				source = raw.pipe(check);
			}
			// One entry in flight: the next upload is opened only when this one is written. A
			// reader that goes away (a cancelled download) closes the archive and ends the loop.
			const written = entryWritten(archive);
			archive.append(source, { name: e.name, date });
			await written;
			open = null;
		}
		archive.append(manifest, { name: MANIFEST_NAME, date });
		await archive.finalize();
	};
	add().catch((err: unknown) => {
		open?.destroy();
		archive.destroy(err instanceof Error ? err : new Error(String(err)));
	});
	return archive;
}
