// The storage interface's contract, held by both back ends alike.
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startS3Fake, type S3Fake } from '../../../../scripts/lib/s3-fake';
import { keyOfName, objectName, readAll, type StorageBackend } from './backend';
import { LocalStorage } from './local';
import { fakeBucket } from './test-support';

let fake: S3Fake;
const stores: Record<string, StorageBackend> = {};

beforeAll(async () => {
	fake = await startS3Fake();
	stores.local = new LocalStorage(mkdtempSync(join(tmpdir(), 'beadline-backend-')));
	stores.s3 = fakeBucket(fake);
});
afterAll(async () => {
	await stores.s3?.close();
	await fake.close();
});

const KEY = `${'3f'.repeat(16)}.pdf`;

describe.each(['local', 's3'])('%s back end', (kind) => {
	const store = () => stores[kind]!;

	it('puts bytes and streams whole, gets them back with their size, deletes twice', async () => {
		await store().check();
		const name = objectName(KEY);
		expect(await store().exists(name)).toBe(false);
		expect(await store().get(name)).toBeNull();
		await store().put(name, new TextEncoder().encode('%PDF-1.4\n'));
		const found = await store().get(name);
		expect(found?.bytes).toBe(9);
		expect((await readAll(found!.body)).toString()).toBe('%PDF-1.4\n');
		// A stream of unknown length (lib-storage's Upload on S3; a temp file, then rename, locally).
		const big = Buffer.alloc(6 * 1024 * 1024, 7);
		await store().put(
			'orphaned/x/big.pdf',
			Readable.from([big.subarray(0, 1e6), big.subarray(1e6)])
		);
		expect((await store().get('orphaned/x/big.pdf'))?.bytes).toBe(big.length);
		const listed = [];
		for await (const o of store().list()) listed.push([o.name, o.bytes]);
		expect(listed.sort()).toEqual([
			[name, 9],
			['orphaned/x/big.pdf', big.length]
		]);
		const under = [];
		for await (const o of store().list('orphaned/')) under.push(o.name);
		expect(under).toEqual(['orphaned/x/big.pdf']);
		await store().delete(name);
		await store().delete(name);
		await store().delete('orphaned/x/big.pdf');
		expect(await store().exists(name)).toBe(false);
	});

	it('refuses names that are not its own: no `..`, no absolute paths', async () => {
		for (const bad of ['../x.jpg', '/etc/passwd', 'ab/../../x', 'a//b', '.hidden'])
			await expect(store().put(bad, new Uint8Array(1)), bad).rejects.toThrow(/Not a storage/);
		expect(() => objectName('../../etc/passwd')).toThrow(/Not a storage key/);
		expect(keyOfName(objectName(KEY))).toBe(KEY);
		expect(keyOfName(`orphaned/${KEY}`)).toBeNull();
	});
});
