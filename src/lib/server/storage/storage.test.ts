import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startS3Fake, type S3Fake } from '../../../../scripts/lib/s3-fake';

const dir = mkdtempSync(join(tmpdir(), 'beadline-uploads-'));
process.env.UPLOADS_DIR = dir;

const { discardUploads, openUpload, saveUpload, sniff, UploadRefused } = await import('./index');
const { storage } = await import('./select');

const IMAGES = { accept: ['image/jpeg', 'image/png'] as const, maxBytes: 10 * 1024 * 1024 };

/** A 40 x 20 JPEG whose EXIF says "rotate 90° clockwise" and carries a camera make. */
async function rotatedJpeg(): Promise<Uint8Array> {
	return sharp({ create: { width: 40, height: 20, channels: 3, background: '#c33' } })
		.jpeg()
		.withMetadata({ orientation: 6, exif: { IFD0: { Make: 'SecretCam' } } })
		.toBuffer();
}

/** The names of everything in the store, whichever back end it is. */
async function allFiles(): Promise<string[]> {
	const names: string[] = [];
	for await (const o of (await storage()).list()) names.push(o.name.split('/').pop() ?? o.name);
	return names;
}

// The same checks on both back ends: the local folder and a bucket (s3rver on a free port).
describe.each(['local', 's3'] as const)('storage on %s', (kind) => {
	let fake: S3Fake | null = null;
	beforeAll(async () => {
		if (kind !== 's3') return;
		fake = await startS3Fake();
		Object.assign(process.env, fake.env);
	});
	afterAll(async () => {
		if (!fake) return;
		await (await storage()).close();
		for (const k of Object.keys(fake.env)) delete process.env[k];
		await fake.close();
	});

	it('sniffs JPEG, PNG and PDF by content only', () => {
		expect(sniff(new Uint8Array([0xff, 0xd8, 0xff, 0xe0]))).toBe('image/jpeg');
		expect(sniff(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0]))).toBe(
			'image/png'
		);
		expect(sniff(new TextEncoder().encode('%PDF-1.7\n'))).toBe('application/pdf');
		// A Windows executable starts "MZ" whatever it is called.
		expect(sniff(new TextEncoder().encode('MZ\x90\x00'))).toBeNull();
	});

	it('re-encodes an image upright, without its metadata, with a thumbnail, under a random name', async () => {
		const stored = await saveUpload(await rotatedJpeg(), { ...IMAGES, name: 'IMG_0001.jpg' });
		expect(stored.key).toMatch(/^[0-9a-f]{32}\.jpg$/);
		expect(stored.thumbKey).toMatch(/^[0-9a-f]{32}-t\.jpg$/);
		const bytes = await openUpload(stored.key);
		const meta = await sharp(bytes as Buffer).metadata();
		expect([meta.width, meta.height]).toEqual([20, 40]);
		expect(meta.orientation).toBeUndefined();
		expect(meta.exif).toBeUndefined();
		expect((bytes as Buffer).includes('SecretCam')).toBe(false);
		expect(await openUpload(stored.thumbKey as string)).not.toBeNull();
		// No temporary files are left behind and nothing carries the uploaded name.
		expect((await allFiles()).some((f) => f.endsWith('.part') || f.includes('IMG_0001'))).toBe(
			false
		);
	});

	it('refuses a renamed executable, a broken JPEG, an empty and an oversized file', async () => {
		const exe = new TextEncoder().encode('MZ\x90\x00\x03\x00\x00\x00 not an image');
		await expect(saveUpload(exe, { ...IMAGES, name: 'photo.jpg' })).rejects.toThrow(
			/not a JPEG or PNG file/
		);
		const broken = new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3, 4, 5]);
		await expect(saveUpload(broken, IMAGES)).rejects.toBeInstanceOf(UploadRefused);
		await expect(saveUpload(new Uint8Array(), IMAGES)).rejects.toThrow(/empty/);
		const big = new Uint8Array(11 * 1024 * 1024);
		big.set([0xff, 0xd8, 0xff]);
		await expect(saveUpload(big, IMAGES)).rejects.toThrow(/limit is 10 MB/);
	});

	it('keeps PDFs as sent and never opens a path that is not one of its keys', async () => {
		const pdf = new TextEncoder().encode('%PDF-1.4\n%%EOF\n');
		const stored = await saveUpload(pdf, { accept: ['application/pdf'], maxBytes: 1024 });
		expect(stored.key).toMatch(/\.pdf$/);
		expect((await openUpload(stored.key))?.toString()).toBe('%PDF-1.4\n%%EOF\n');
		expect(await openUpload('../../etc/passwd')).toBeNull();
		await discardUploads([stored.key]);
		expect(await openUpload(stored.key)).toBeNull();
	});
});
