import fc from 'fast-check';
import { PassThrough, Readable } from 'node:stream';
import { finished } from 'node:stream/promises';
import { describe, expect, it } from 'vitest';
import { readAll, unzip } from '$lib/test-support/unzip';
import {
	checkFiles,
	MANIFEST_NAME,
	manifestText,
	parseManifest,
	sha256Hex,
	uniqueNames,
	zipName,
	type Manifest
} from './manifest';
import { zipStream, type ZipEntry } from './zip';

const AT = new Date('2026-12-03T10:00:00Z');

function manifestOf(files: { name: string; bytes: Uint8Array }[]): Manifest {
	return {
		kind: 'beadline-data-book',
		v: 1,
		token: 'x'.repeat(32),
		verifyUrl: 'http://localhost/verify/x',
		shop: 'Invented Shop',
		job: { number: 'J-1', customer: 'C', part: 'P', drawing: 'D', drawingRev: 'A', code: 'shop' },
		compiledAt: AT.toISOString(),
		compiledBy: 'Test Person',
		records: { digest: '0'.repeat(64), sections: {}, counts: {} },
		files: files.map((f) => ({
			name: f.name,
			kind: 'weld-log',
			sha256: sha256Hex(f.bytes),
			bytes: f.bytes.length
		})),
		note: ''
	};
}

/** What yauzl finds in the ZIP, as the manifest checker takes it. */
const found = (entries: Map<string, Buffer>) =>
	new Map([...entries].map(([n, b]) => [n, { sha256: sha256Hex(b), bytes: b.length }]));

// A set of files (names as a shop would give them, any bytes), half of them streamed.
const filesArb = fc
	.array(
		fc.record({
			folder: fc.constantFrom('', 'procedures', 'welders', 'inspection-reports'),
			base: fc.string({ minLength: 0, maxLength: 30 }),
			bytes: fc.uint8Array({ minLength: 0, maxLength: 3000 }),
			streamed: fc.boolean()
		}),
		{ minLength: 0, maxLength: 8 }
	)
	.map((xs) => {
		const names = uniqueNames(xs.map((x) => zipName(x.folder, x.base, 'pdf')));
		return xs.map((x, i) => ({ ...x, name: names[i]! }));
	});

const entriesOf = (files: { name: string; bytes: Uint8Array; streamed: boolean }[]): ZipEntry[] =>
	files.map((f) =>
		f.streamed
			? {
					name: f.name,
					sha256: sha256Hex(f.bytes),
					open: async () => Readable.from([Buffer.from(f.bytes)])
				}
			: { name: f.name, bytes: f.bytes }
	);

describe('the data book manifest', () => {
	it('always lists every file of the compiled ZIP with its SHA-256 and size, and nothing else', async () => {
		await fc.assert(
			fc.asyncProperty(filesArb, async (files) => {
				const m = manifestOf(files);
				const text = manifestText(m);
				const zip = await readAll(zipStream(entriesOf(files), text, AT));
				const entries = await unzip(zip);
				// The manifest travels as the ZIP's last entry, byte for byte what the row keeps.
				expect(entries.get(MANIFEST_NAME)?.toString('utf8')).toBe(text);
				expect([...entries.keys()].at(-1)).toBe(MANIFEST_NAME);
				const back = parseManifest(entries.get(MANIFEST_NAME)!.toString('utf8'))!;
				expect(checkFiles(back, found(entries))).toEqual([]);
				expect(entries.size).toBe(files.length + 1);
			}),
			{ numRuns: 40 }
		);
	});

	it('tells a changed, missing or extra file apart from a match', async () => {
		await fc.assert(
			fc.asyncProperty(
				filesArb.filter((f) => f.length > 0),
				fc.nat(),
				async (files, pick) => {
					const m = manifestOf(files);
					const entries = await unzip(
						await readAll(zipStream(entriesOf(files), manifestText(m), AT))
					);
					const name = files[pick % files.length]!.name;
					const changed = new Map(entries);
					changed.set(name, Buffer.concat([entries.get(name)!, Buffer.from([1])]));
					expect(checkFiles(m, found(changed))).toEqual([
						`${name} is not the file the data book was compiled with.`
					]);
					const missing = new Map(entries);
					missing.delete(name);
					expect(checkFiles(m, found(missing))).toEqual([`${name} is missing.`]);
					const extra = new Map(entries).set('extra.pdf', Buffer.from('x'));
					expect(checkFiles(m, found(extra))).toEqual(['extra.pdf is not listed in the manifest.']);
				}
			),
			{ numRuns: 25 }
		);
	});

	it('fails the download when a streamed file is not the bytes the manifest promised', async () => {
		const entries: ZipEntry[] = [
			{ name: 'a.pdf', bytes: Buffer.from('first') },
			{
				name: 'b.pdf',
				sha256: sha256Hex('promised'),
				open: async () => Readable.from([Buffer.from('other')])
			}
		];
		await expect(readAll(zipStream(entries, '{}', AT))).rejects.toThrow(/b.pdf changed/);
	});

	it('lets go of an open upload when the reader goes away mid-download', async () => {
		const upload = new PassThrough();
		upload.write(Buffer.alloc(64 * 1024, 7)); // and never ends, as a slow store would not
		const archive = zipStream(
			[{ name: 'slow.pdf', sha256: '0'.repeat(64), open: async () => upload }],
			'{}',
			AT
		);
		archive.once('data', () => archive.destroy());
		await finished(upload).catch(() => undefined);
		expect(upload.destroyed).toBe(true);
	});

	it('names files safely and uniquely, never as the manifest', () => {
		expect(zipName('welders', 'Dana Ó Briain/..', 'pdf')).toBe('welders/Dana-O-Briain.pdf');
		expect(uniqueNames(['a.pdf', 'A.pdf', 'a.pdf', MANIFEST_NAME])).toEqual([
			'a.pdf',
			'A-2.pdf',
			'a-3.pdf',
			'manifest-2.json'
		]);
		expect(parseManifest('not json')).toBeNull();
		expect(parseManifest('{"kind":"other"}')).toBeNull();
	});
});
