// copyUploads: a folder's uploads into a bucket and back, verified by size and SHA-256.
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startS3Fake, type S3Fake } from '../../../../scripts/lib/s3-fake';
import { objectName, readAll, type StorageBackend } from './backend';
import { copyUploads } from './copy';
import { LocalStorage } from './local';
import type { S3Storage } from './s3';
import { fakeBucket } from './test-support';

let fake: S3Fake;
let bucket: S3Storage;
const folder = () => new LocalStorage(mkdtempSync(join(tmpdir(), 'beadline-copy-')));

beforeAll(async () => {
	fake = await startS3Fake();
	bucket = fakeBucket(fake);
});
afterAll(async () => {
	await bucket.close();
	await fake.close();
});

async function names(store: StorageBackend): Promise<string[]> {
	const out: string[] = [];
	for await (const o of store.list()) out.push(o.name);
	return out.sort();
}

describe('copyUploads', () => {
	it('copies every object folder → bucket → folder, verifies each, and is safe to re-run', async () => {
		const source = folder();
		const objects = {
			[objectName(`${'a1'.repeat(16)}.jpg`)]: Buffer.alloc(300_000, 1),
			[objectName(`${'a1'.repeat(16)}-t.jpg`)]: Buffer.from('thumb'),
			[objectName(`${'b2'.repeat(16)}.pdf`)]: Buffer.from('%PDF-1.4\n%%EOF\n'),
			[`orphaned/2026-01-01T00-00-00-000Z/${'c3'.repeat(16)}.png`]: Buffer.from('aside')
		};
		for (const [name, bytes] of Object.entries(objects)) await source.put(name, bytes);
		// A `.part` leftover of a killed write was never acknowledged: not copied.
		await source.put(`${objectName(`${'d4'.repeat(16)}.jpg`)}.0a1b.part`, Buffer.from('x'));

		const there = await copyUploads(source, bucket);
		expect(there).toEqual({ copied: 4, skipped: 0, bytes: 300_000 + 5 + 15 + 5, problems: [] });
		expect(await names(bucket)).toEqual(Object.keys(objects).sort());

		const back = folder();
		expect((await copyUploads(bucket, back)).copied).toBe(4);
		for (const [name, bytes] of Object.entries(objects))
			expect(Buffer.compare(await readAll((await back.get(name))!.body), bytes), name).toBe(0);

		// Interrupted and run again: what is there intact is skipped.
		expect(await copyUploads(source, bucket)).toMatchObject({
			copied: 0,
			skipped: 4,
			problems: []
		});
	});

	it('reports an object of the same name with other content in the target, and leaves it', async () => {
		const [a, b] = [folder(), folder()];
		const name = objectName(`${'e5'.repeat(16)}.pdf`);
		await a.put(name, Buffer.from('%PDF-1.4 one'));
		await b.put(name, Buffer.from('%PDF-1.4 two'));
		const r = await copyUploads(a, b);
		expect(r.problems).toEqual([
			`${name}: a different object of that name is already in the target`
		]);
		expect((await readAll((await b.get(name))!.body)).toString()).toBe('%PDF-1.4 two');
	});
});
