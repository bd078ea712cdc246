// Reading a downloaded data book in the e2e journeys: every file against the manifest's SHA-256
// and size (yauzl reads the ZIP), and the QR code on the weld map's cover (jsqr).
import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { unzip } from '../../src/lib/test-support/unzip';
import { pdfQr } from './pdf';

interface Listed {
	name: string;
	kind: string;
	sha256: string;
	bytes: number;
}

export async function readDataBook(path: string) {
	const files = await unzip(await readFile(path));
	const manifest = JSON.parse(files.get('manifest.json')?.toString('utf8') ?? 'null') as {
		verifyUrl: string;
		files: Listed[];
	};
	const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex');
	const mismatches = manifest.files.filter((f) => {
		const b = files.get(f.name);
		return !b || sha(b) !== f.sha256 || b.length !== f.bytes;
	});
	const unlisted = [...files.keys()].filter(
		(n) => n !== 'manifest.json' && !manifest.files.some((f) => f.name === n)
	);
	const map = manifest.files.find((f) => f.kind === 'weld-log');
	const qr = map ? await pdfQr(files.get(map.name)!, 1, 3) : null;
	return { files, manifest, mismatches, unlisted, qr };
}
