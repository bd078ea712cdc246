// The same hostile-upload checks (tests/support/hostile-uploads-suite.ts) on STORAGE=s3: an own
// server whose uploads go to a bucket (s3rver on a free port), so refusals, re-encoding, random
// keys and the download headers are proven on the S3 back end too. Also: the local folder stays
// empty, and a bucket that is not there stops start-up with one sentence.
import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import { signInCookie } from '../scripts/bench/http';
import { startS3Fake, type S3Fake } from '../scripts/lib/s3-fake';
import { openSqlite } from '../scripts/lib/sqlite-file';
import { S3Storage } from '../src/lib/server/storage/s3';
import { s3Settings } from '../src/lib/server/storage/s3-settings';
import { hostileUploadTests } from './support/hostile-uploads-suite';
import { ownServer, type OwnServer } from './support/own-server';

test.describe.configure({ mode: 'serial' });

let fake: S3Fake;
let server: OwnServer;
let bucket: S3Storage;
const cookies = new Map<string, Promise<string>>();

test.beforeAll(async () => {
	test.setTimeout(120_000);
	fake = await startS3Fake();
	bucket = new S3Storage(
		s3Settings({
			bucket: fake.bucket,
			region: '',
			endpoint: fake.endpoint,
			accessKeyId: fake.env.S3_ACCESS_KEY_ID!,
			secretAccessKey: fake.env.S3_SECRET_ACCESS_KEY!,
			forcePathStyle: 'true'
		})
	);
	server = await ownServer({ env: fake.env });
	await server.start();
});

test.afterAll(async () => {
	await server?.dispose();
	await bucket?.close();
	await fake?.close();
});

hostileUploadTests({
	origin: () => server.origin,
	cookieOf(who) {
		let c = cookies.get(who.email);
		if (!c) cookies.set(who.email, (c = signInCookie(server.origin, who.email, who.password)));
		return c;
	},
	async withDatabase(work) {
		const db = await openSqlite(server.databaseFile, { readonly: true });
		try {
			return await work(db);
		} finally {
			await db.close();
		}
	},
	async storedNames() {
		const names: string[] = [];
		for await (const o of bucket.list()) names.push(o.name);
		return names;
	}
});

test('on S3 the uploads are in the bucket, none in the local folder', async () => {
	const inBucket: string[] = [];
	for await (const o of bucket.list()) inBucket.push(o.name);
	expect(inBucket.length).toBeGreaterThan(0);
	expect(existsSync(join(server.dataDir, 'uploads'))).toBe(false);
});

test('a missing bucket stops the server with one sentence naming S3_BUCKET', async () => {
	// Not spawnSync: the bucket (s3rver) answers from this very process.
	const child = spawn(process.execPath, [`${process.env.BUILD_DIR ?? 'build'}/index.js`], {
		env: { ...server.env, S3_BUCKET: 'not-there', PORT: '0' },
		stdio: ['ignore', 'ignore', 'pipe']
	});
	let stderr = '';
	child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
	const status = await new Promise<number | null>((resolve) => child.once('exit', resolve));
	expect(status).toBe(1);
	expect(stderr.trim()).toBe(`S3_BUCKET "not-there" does not exist at ${fake.endpoint}.`);
});
