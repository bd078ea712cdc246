// The hostile-upload checks, defined once and run against any server: the shared end-to-end
// server (local folder, tests/hostile-uploads.test.ts) and an own server with STORAGE=s3
// (tests/hostile-uploads-s3.test.ts): record photos, PQR lab reports and job drawings (the same
// storage path as inspection reports). Each file is refused (400 with a message, nothing stored)
// or neutralised: stored under a random name, re-encoded (images: trailing script and metadata
// gone), and served with its real type, nosniff, a Content-Disposition of our own and no caching.
import { existsSync } from 'node:fs';
import { expect, test } from '@playwright/test';
import sharp from 'sharp';
import type { SqliteFile } from '../../scripts/lib/sqlite-file';
import { SCRIPT_MARK, photoCorpus, reportCorpus, type HostileFile } from './hostile-files';
import { engineer, otherAdmin } from './people';

export interface UploadTarget {
	origin(): string;
	cookieOf(who: { email: string; password: string }): Promise<string>;
	withDatabase<T>(work: (db: SqliteFile) => Promise<T>): Promise<T>;
	/** Every stored object's name (`ab/ab…ef.jpg`), in the folder or the bucket. */
	storedNames(): Promise<string[]>;
}

export function hostileUploadTests(target: UploadTarget): void {
	const { origin, cookieOf } = target;
	const withE2eDatabase = target.withDatabase;
	const postJson = (path: string, cookie: string, body: unknown) =>
		fetch(origin() + path, {
			method: 'POST',
			redirect: 'manual',
			headers: { cookie, origin: origin(), 'content-type': 'application/json' },
			body: JSON.stringify(body)
		});
	const postForm = (path: string, cookie: string, body: FormData) =>
		fetch(origin() + path, {
			method: 'POST',
			redirect: 'manual',
			headers: { cookie, origin: origin(), accept: 'text/html' },
			body
		});

	const KEY = /^[0-9a-f]{2}\/[0-9a-f]{32}(-t)?\.(jpg|png|pdf)$/;

	function expectSafeHeaders(res: Response, type: RegExp) {
		const h = res.headers;
		expect(h.get('content-type')).toMatch(type);
		expect(h.get('x-content-type-options')).toBe('nosniff');
		expect(h.get('cache-control')).toContain('no-store');
		expect(h.get('content-disposition')).toBeTruthy();
		expect(h.get('x-injected')).toBeNull();
	}

	async function storageKeysAreOurs() {
		const files = await target.storedNames();
		const strangers = files.filter((f) => !KEY.test(f) && !f.startsWith('orphaned/'));
		expect(strangers).toEqual([]);
		expect(existsSync('/tmp/beadline-traversal.png')).toBe(false);
	}

	test('record photos: hostile files are refused or neutralised', async () => {
		test.setTimeout(120_000);
		const cookie = await cookieOf(engineer);
		const outsider = await cookieOf(otherAdmin);
		const results: string[] = [];
		for (const [i, f] of (await photoCorpus()).entries()) {
			const marker = `hostile-photo-${Date.now()}-${i}`;
			const form = new FormData();
			for (const [k, v] of Object.entries({
				process: 'GTAW',
				weldedOn: '2025-04-01',
				notes: marker
			}))
				form.set(k, v);
			form.append('photos', new Blob([new Uint8Array(f.bytes)], { type: f.type }), f.name);
			const res = await postForm('/records/new?/save', cookie, form);
			const stored = await withE2eDatabase((db) =>
				db.all<{ id: number; photo: number }>(
					`SELECT r.id, p.id AS photo FROM settings_records r LEFT JOIN settings_photos p ON p.record_id = r.id
					 WHERE r.notes = ?`,
					[marker]
				)
			);
			if (f.expect === 'refused') {
				expect(res.status, f.label).toBe(400);
				expect(await res.text(), f.label).toMatch(
					/is not a JPEG or PNG|cannot be read|limit is|MB/
				);
				expect(stored, `${f.label}: nothing is stored`).toEqual([]);
			} else {
				expect(res.status, f.label).toBe(303);
				const { id, photo } = stored[0]!;
				for (const size of ['', '?size=thumb']) {
					const served = await fetch(`${origin()}/records/${id}/photos/${photo}${size}`, {
						headers: { cookie }
					});
					expect(served.status, f.label).toBe(200);
					expectSafeHeaders(served, /^image\/(jpeg|png)$/);
					expect(served.headers.get('content-disposition')).not.toContain(f.name);
					const bytes = Buffer.from(await served.arrayBuffer());
					expect(bytes.includes(Buffer.from('beadline-xss')), f.label).toBe(false);
					expect(bytes.includes(Buffer.from('beadline-exif-secret')), f.label).toBe(false);
					await sharp(bytes, { failOn: 'error' }).stats(); // a whole, decodable image
				}
				// Another shop, and nobody signed in, learn nothing of it.
				const other = await fetch(`${origin()}/records/${id}/photos/${photo}`, {
					headers: { cookie: outsider },
					redirect: 'manual'
				});
				expect(other.status).toBe(404);
				const anon = await fetch(`${origin()}/records/${id}/photos/${photo}`, {
					redirect: 'manual'
				});
				expect(anon.status).toBe(303);
			}
			results.push(`${f.label}: ${f.expect}`);
		}
		await storageKeysAreOurs();
		console.log(
			`[uploads] record photos, ${results.length} hostile files:\n  ${results.join('\n  ')}`
		);
	});

	test('PQR lab reports: hostile files are refused or neutralised', async () => {
		const cookie = await cookieOf(engineer);
		// A draft of our own: only a draft PQR takes lab reports.
		const created = await postJson('/api/v1/pqrs', cookie, {
			number: `PQR-HOSTILE-${Date.now()}`,
			title: 'Hostile uploads'
		});
		expect(created.status).toBe(201);
		const pqr = (await created.json()) as { id: number };
		const results: string[] = [];
		for (const f of reportCorpus() as HostileFile[]) {
			const before = await withE2eDatabase((db) =>
				db.get<{ n: number }>('SELECT max(id) AS n FROM pqr_reports')
			);
			const form = new FormData();
			form.append('report', new Blob([new Uint8Array(f.bytes)], { type: f.type }), f.name);
			const res = await postForm(`/pqrs/${pqr.id}?/upload`, cookie, form);
			const added = await withE2eDatabase((db) =>
				db.all<{ id: number }>('SELECT id FROM pqr_reports WHERE id > ? AND pqr_id = ?', [
					before?.n ?? 0,
					pqr.id
				])
			);
			if (f.expect === 'refused') {
				expect(res.status, f.label).toBe(400);
				expect(added, f.label).toEqual([]);
			} else {
				expect(res.status, f.label).toBe(303);
				expect(added.length, f.label).toBe(1);
				const served = await fetch(`${origin()}/pqrs/${pqr.id}/reports/${added[0]!.id}`, {
					headers: { cookie }
				});
				expect(served.status, f.label).toBe(200);
				expectSafeHeaders(served, /^application\/pdf$/);
				// Never shown inline: a PDF viewer never runs its script inside our origin.
				expect(served.headers.get('content-disposition')).toMatch(/^attachment;/);
				expect(served.headers.get('content-security-policy')).toContain("default-src 'none'");
				expect(served.headers.get('content-disposition')).not.toMatch(/[\r\n]|\.\.\//);
			}
			results.push(`${f.label}: ${f.expect}`);
		}
		expect(SCRIPT_MARK).toContain('script');
		await storageKeysAreOurs();
		console.log(
			`[uploads] PQR reports, ${results.length} hostile files:\n  ${results.join('\n  ')}`
		);
	});

	test('job drawings: hostile files are refused or neutralised', async () => {
		test.setTimeout(120_000);
		const cookie = await cookieOf(engineer);
		const opened = new FormData();
		for (const [k, v] of Object.entries({
			number: `JOB-HOSTILE-${Date.now()}`,
			customer: 'Invented Hostile Co',
			part: 'Upload frame',
			code: 'aws-d1.1'
		}))
			opened.set(k, v);
		const made = await postForm('/jobs/new', cookie, opened);
		expect(made.status).toBe(303);
		const jobPath = new URL(made.headers.get('location')!, origin()).pathname;
		const jobId = Number(jobPath.split('/').pop());
		const keyOf = () =>
			withE2eDatabase((db) =>
				db.get<{ k: string | null }>('SELECT drawing_key AS k FROM jobs WHERE id = ?', [jobId])
			);
		const results: string[] = [];
		// A drawing may be a PDF or an image up to 20 MB: the PDF where a photo goes and the photo
		// over the photos' 10 MB are taken here (the "PNG where a PDF goes" is a pixel flood).
		const takenHere = /^(PDF where a photo goes|oversize JPEG)/;
		const corpus = [...(await photoCorpus()), ...reportCorpus()] as HostileFile[];
		for (const f of corpus.map((c) =>
			takenHere.test(c.label) ? { ...c, expect: 'neutralised' as const } : c
		)) {
			const before = (await keyOf())?.k ?? null;
			const form = new FormData();
			form.append('drawing', new Blob([new Uint8Array(f.bytes)], { type: f.type }), f.name);
			const res = await postForm(`${jobPath}?/drawing`, cookie, form);
			const after = (await keyOf())?.k ?? null;
			if (f.expect === 'refused') {
				expect(res.status, f.label).toBe(400);
				expect(after, `${f.label}: the drawing is unchanged`).toBe(before);
			} else {
				expect(res.status, f.label).toBe(200);
				expect(after, f.label).not.toBe(before);
				const served = await fetch(`${origin()}${jobPath}/drawing`, { headers: { cookie } });
				expect(served.status, f.label).toBe(200);
				expectSafeHeaders(served, /^(image\/(jpeg|png)|application\/pdf)$/);
				expect(served.headers.get('content-security-policy')).toContain("default-src 'none'");
				expect(served.headers.get('content-disposition')).not.toMatch(/[\r\n]|\.\.\//);
				const bytes = Buffer.from(await served.arrayBuffer());
				if (served.headers.get('content-type') !== 'application/pdf') {
					expect(bytes.includes(Buffer.from('beadline-xss')), f.label).toBe(false);
					expect(bytes.includes(Buffer.from('beadline-exif-secret')), f.label).toBe(false);
				}
			}
			results.push(`${f.label}: ${f.expect}`);
		}
		await storageKeysAreOurs();
		console.log(
			`[uploads] job drawings, ${results.length} hostile files:\n  ${results.join('\n  ')}`
		);
	});
}
