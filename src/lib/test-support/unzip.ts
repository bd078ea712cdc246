// Reading a ZIP back the way the customer's tools would, for tests: every entry's bytes, with
// yauzl (a reader of its own, not the archiver that wrote it).
import type { Readable } from 'node:stream';
import yauzl from 'yauzl';

export async function readAll(stream: Readable): Promise<Buffer> {
	const chunks: Buffer[] = [];
	for await (const c of stream as AsyncIterable<Buffer>) chunks.push(c);
	return Buffer.concat(chunks);
}

/** Every file entry of the ZIP by name, in the order of the central directory. */
export function unzip(zip: Buffer): Promise<Map<string, Buffer>> {
	return new Promise((resolve, reject) => {
		yauzl.fromBuffer(zip, { lazyEntries: true, strictFileNames: true }, (err, file) => {
			if (err || !file) return reject(err ?? new Error('no zip'));
			const out = new Map<string, Buffer>();
			file.on('error', reject);
			file.on('end', () => resolve(out));
			file.on('entry', (entry: yauzl.Entry) => {
				if (entry.fileName.endsWith('/')) return file.readEntry();
				file.openReadStream(entry, (e, s) => {
					if (e || !s) return reject(e ?? new Error('no stream'));
					readAll(s).then((b) => {
						out.set(entry.fileName, b);
						file.readEntry();
					}, reject);
				});
			});
			file.readEntry();
		});
	});
}
