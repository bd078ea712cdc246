// The data book's manifest: every file of the ZIP with its SHA-256 and size, and the digests of
// the records the book was compiled from (so the public verification page can say whether the
// shop's records still say the same). manifest.json is the last entry of the ZIP and is not
// listed in itself; its own SHA-256 is kept with the data book's row.
import { createHash } from 'node:crypto';

export const MANIFEST_NAME = 'manifest.json';

export type FileKind = 'weld-log' | 'procedure-sheet' | 'welder-card' | 'inspection-report';

export interface ManifestFile {
	name: string;
	kind: FileKind;
	sha256: string;
	bytes: number;
}

/** One digest a section of the records (job, joints, welds …), and one over all of them. */
export interface RecordDigests {
	digest: string;
	sections: Record<string, string>;
	counts: Record<string, number>;
}

export interface Manifest {
	kind: 'beadline-data-book';
	v: 1;
	token: string;
	verifyUrl: string;
	shop: string;
	job: {
		number: string;
		customer: string;
		part: string;
		drawing: string;
		drawingRev: string;
		code: string;
	};
	compiledAt: string;
	compiledBy: string;
	records: RecordDigests;
	files: ManifestFile[];
	note: string;
}

export const sha256Hex = (bytes: Uint8Array | string): string =>
	createHash('sha256').update(bytes).digest('hex');

/** The exact bytes of manifest.json: readable (indented), one trailing newline. */
export const manifestText = (m: Manifest): string => `${JSON.stringify(m, null, '\t')}\n`;

/** A file name safe in any ZIP reader and file system: letters, digits, dash, one dot, a folder. */
export function zipName(folder: string, base: string, ext: string): string {
	const safe =
		base
			.normalize('NFKD')
			.replace(/[^A-Za-z0-9_-]+/g, '-')
			.replace(/^-+|-+$/g, '')
			.slice(0, 80) || 'file';
	return `${folder ? `${folder}/` : ''}${safe}.${ext}`;
}

/** Names made unique by a counter before the extension (two reports both called "rt.pdf"). */
export function uniqueNames(names: string[]): string[] {
	const seen = new Set<string>();
	return names.map((name) => {
		let out = name;
		const dot = name.lastIndexOf('.');
		const [stem, ext] =
			dot > name.lastIndexOf('/') ? [name.slice(0, dot), name.slice(dot)] : [name, ''];
		for (let i = 2; seen.has(out.toLowerCase()) || out === MANIFEST_NAME; i++)
			out = `${stem}-${i}${ext}`;
		seen.add(out.toLowerCase());
		return out;
	});
}

/**
 * What is wrong between a manifest and the files found beside it: a listed file missing or with
 * other bytes, or a file the manifest does not list. An empty list means they match.
 */
export function checkFiles(
	manifest: Pick<Manifest, 'files'>,
	found: ReadonlyMap<string, { sha256: string; bytes: number }>
): string[] {
	const problems: string[] = [];
	const listed = new Set<string>();
	for (const f of manifest.files) {
		listed.add(f.name);
		const got = found.get(f.name);
		if (!got) problems.push(`${f.name} is missing.`);
		else if (got.sha256 !== f.sha256 || got.bytes !== f.bytes)
			problems.push(`${f.name} is not the file the data book was compiled with.`);
	}
	for (const name of found.keys())
		if (!listed.has(name) && name !== MANIFEST_NAME)
			problems.push(`${name} is not listed in the manifest.`);
	return problems;
}

/** Reads a manifest back (from the row or an upload); null when it is not one of ours. */
export function parseManifest(text: string): Manifest | null {
	try {
		const m = JSON.parse(text) as Partial<Manifest>;
		if (m?.kind !== 'beadline-data-book' || m.v !== 1 || !Array.isArray(m.files)) return null;
		if (typeof m.records?.digest !== 'string' || typeof m.token !== 'string') return null;
		return m as Manifest;
	} catch {
		return null;
	}
}
