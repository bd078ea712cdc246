import { existsSync, mkdirSync, mkdtempSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { beforeAll, describe, expect, it } from 'vitest';
import { startS3Fake } from '../../../../scripts/lib/s3-fake';

const dir = mkdtempSync(join(tmpdir(), 'beadline-sweep-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { SettingsPhoto } = await import('../models');
const { newShop, addMember } = await import('../people/test-support');
const { createRecord } = await import('../records');
const { settingsRecordSchema } = await import('$lib/schemas/settings-record');
const { sweepUploads, ORPHANED_DIR } = await import('./upload-sweep');
const { fakeBucket } = await import('../storage/test-support');
const { objectName } = await import('../storage/backend');

const up = (name: string) => join(dir, 'uploads', name.slice(0, 2), name);
const hour = (n: number) => new Date(Date.now() + n * 3_600_000);
function plant(name: string, at: Date): void {
	mkdirSync(join(dir, 'uploads', name.slice(0, 2)), { recursive: true });
	writeFileSync(up(name), 'left by a killed process');
	utimesSync(up(name), at, at);
}

let kept: string[];

beforeAll(async () => {
	const { shopId } = await newShop('Sweep Shop');
	const engineer = await addMember(shopId, 'engineer');
	const png = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#000' } })
		.png()
		.toBuffer();
	const form = settingsRecordSchema.parse({ process: 'GTAW', weldedOn: '2025-01-02' });
	const { id } = await createRecord(engineer, form, [{ name: 'a.png', bytes: png }]);
	const photo = await SettingsPhoto.findOne({ where: { recordId: id }, rejectOnEmpty: true });
	kept = [photo.storageKey, photo.thumbKey];
	for (const k of kept) utimesSync(up(k), hour(-2), hour(-2));
});

describe('sweepUploads', () => {
	it('moves aside unfinished and unreferenced files from before the start, nothing else', async () => {
		const orphan = `${'ab'.repeat(16)}.jpg`;
		const part = `${'cd'.repeat(16)}.png.0a1b2c3d.part`;
		const fresh = `${'ef'.repeat(16)}.pdf`; // written after the start: a write in progress
		plant(orphan, hour(-1));
		plant(part, hour(-1));
		plant(fresh, hour(1));
		const r = await sweepUploads(new Date());
		expect(r).toEqual({ partial: [part], orphaned: [orphan] });
		for (const k of kept) expect(existsSync(up(k)), k).toBe(true);
		expect(existsSync(up(fresh))).toBe(true);
		expect(existsSync(up(orphan))).toBe(false);
		const aside = join(dir, 'uploads', ORPHANED_DIR);
		expect(existsSync(aside)).toBe(true);
		// A second start finds nothing more to move.
		expect(await sweepUploads(new Date())).toEqual({ partial: [], orphaned: [] });
	});

	it('in a bucket, moves an unreferenced object only once it is 15 minutes older than the start', async () => {
		const fake = await startS3Fake();
		const bucket = fakeBucket(fake);
		try {
			const orphan = `${'9a'.repeat(16)}.jpg`;
			for (const k of [orphan, ...kept]) await bucket.put(objectName(k), Buffer.from('x'));
			// Just written: another process may be about to commit the row that names it.
			expect(await sweepUploads(new Date(), bucket)).toEqual({ partial: [], orphaned: [] });
			const later = new Date(Date.now() + 16 * 60_000);
			expect(await sweepUploads(later, bucket)).toEqual({ partial: [], orphaned: [orphan] });
			const names: string[] = [];
			for await (const o of bucket.list()) names.push(o.name);
			expect(names.sort()).toEqual(
				[
					...kept.map((k) => objectName(k)),
					`${ORPHANED_DIR}/${later.toISOString().replace(/[:.]/g, '-')}/${orphan}`
				].sort()
			);
		} finally {
			await bucket.close();
			await fake.close();
		}
	});
});
