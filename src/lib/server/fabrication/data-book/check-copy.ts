// A copy of a data book checked against what was compiled: the customer drops the ZIP (every entry
// is hashed as it is inflated, never held whole) or its manifest.json on the public check, and
// learns whether it is byte for byte the book the shop compiled, and if not, which files differ.
// Always against the manifest the shop stored, never against the one the copy brings.
import { createHash } from 'node:crypto';
import yauzl from 'yauzl';
import { checkFiles, MANIFEST_NAME, parseManifest, sha256Hex } from './manifest';

/** Enough for any real data book; a ZIP beyond it is refused, not inflated. */
const MAX_ENTRIES = 2000;
const MAX_INFLATED = 1024 * 1024 * 1024;

export interface CopyCheck {
	kind: 'zip' | 'manifest';
	/** The copy's manifest.json is the one the shop stored (by SHA-256). */
	sameManifest: boolean;
	/** Files that are missing, changed or unlisted (ZIP), or listed otherwise (manifest). */
	problems: string[];
	files: number;
}

export class CopyRefused extends Error {}

const isZip = (b: Uint8Array) => b[0] === 0x50 && b[1] === 0x4b && b[2] === 0x03 && b[3] === 0x04;

/** Every file entry's SHA-256 and size, and the manifest.json text if the ZIP has one. */
function readZip(bytes: Buffer) {
	return new Promise<{
		found: Map<string, { sha256: string; bytes: number }>;
		manifest: string | null;
	}>((resolve, reject) => {
		const refuse = (why: string) => reject(new CopyRefused(why));
		yauzl.fromBuffer(bytes, { lazyEntries: true, validateEntrySizes: true }, (err, zip) => {
			if (err || !zip) return refuse('This file is not a ZIP that can be read.');
			const found = new Map<string, { sha256: string; bytes: number }>();
			let manifest: string | null = null;
			let total = 0;
			zip.on('error', () => refuse('This ZIP is damaged: it cannot be read to the end.'));
			zip.on('end', () => resolve({ found, manifest }));
			zip.on('entry', (entry: yauzl.Entry) => {
				if (entry.fileName.endsWith('/')) return zip.readEntry();
				if (found.size >= MAX_ENTRIES)
					return refuse('This ZIP holds far more files than a data book.');
				zip.openReadStream(entry, (e, stream) => {
					if (e || !stream) return refuse('This ZIP is damaged: an entry cannot be read.');
					const hash = createHash('sha256');
					const keep: Buffer[] = [];
					let n = 0;
					stream.on('data', (chunk: Buffer) => {
						n += chunk.length;
						total += chunk.length;
						if (total > MAX_INFLATED) {
							stream.destroy();
							return refuse('This ZIP inflates to far more than a data book.');
						}
						hash.update(chunk);
						if (entry.fileName === MANIFEST_NAME && n <= 4 * 1024 * 1024) keep.push(chunk);
					});
					stream.on('error', () => refuse('This ZIP is damaged: an entry does not inflate.'));
					stream.on('end', () => {
						if (entry.fileName === MANIFEST_NAME) manifest = Buffer.concat(keep).toString('utf8');
						else found.set(entry.fileName, { sha256: hash.digest('hex'), bytes: n });
						zip.readEntry();
					});
				});
			});
			zip.readEntry();
		});
	});
}

export async function checkCopy(
	bytes: Buffer,
	stored: { manifest: string; manifestDigest: string }
): Promise<CopyCheck> {
	const compiled = parseManifest(stored.manifest);
	if (!compiled) throw new CopyRefused('The shop’s stored manifest cannot be read; ask the shop.');
	if (isZip(bytes)) {
		const { found, manifest } = await readZip(bytes);
		return {
			kind: 'zip',
			sameManifest: manifest !== null && sha256Hex(manifest) === stored.manifestDigest,
			problems: [
				...(manifest === null ? [`The ZIP has no ${MANIFEST_NAME}.`] : []),
				...checkFiles(compiled, found)
			],
			files: found.size
		};
	}
	const text = bytes.toString('utf8');
	const copy = parseManifest(text);
	if (!copy) throw new CopyRefused(`Choose the data book ZIP or its ${MANIFEST_NAME}.`);
	const same = sha256Hex(bytes) === stored.manifestDigest;
	const listed = new Map(copy.files.map((f) => [f.name, { sha256: f.sha256, bytes: f.bytes }]));
	return {
		kind: 'manifest',
		sameManifest: same,
		problems: same ? [] : checkFiles(compiled, listed),
		files: copy.files.length
	};
}
