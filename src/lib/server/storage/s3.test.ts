// STORAGE=s3 configured wrongly stops start-up with one sentence naming the variable: checked
// against a real S3 protocol server (s3rver on a free port), never with a stack trace.
import { createServer } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startS3Fake, type S3Fake } from '../../../../scripts/lib/s3-fake';
import { ConfigError } from '../config-error';
import { explainS3Failure, S3Storage } from './s3';
import { s3Settings } from './s3-settings';

let fake: S3Fake;
let closedPort: number;
beforeAll(async () => {
	fake = await startS3Fake();
	// A port nobody listens on: taken, then released.
	closedPort = await new Promise<number>((resolve) => {
		const s = createServer().listen(0, '127.0.0.1', () => {
			const { port } = s.address() as { port: number };
			s.close(() => resolve(port));
		});
	});
});
afterAll(() => fake.close());

const good = () => ({
	bucket: fake.bucket,
	region: 'us-east-1',
	endpoint: fake.endpoint,
	accessKeyId: 'S3RVER',
	secretAccessKey: 'S3RVER',
	forcePathStyle: 'true'
});

/** The start-up check's message for these settings, or null when it passes. */
async function startUp(over: Partial<ReturnType<typeof good>>): Promise<string | null> {
	let store: S3Storage | null = null;
	try {
		store = new S3Storage(s3Settings({ ...good(), ...over }));
		await store.check();
		return null;
	} catch (e) {
		expect(e).toBeInstanceOf(ConfigError);
		const message = (e as Error).message;
		// One sentence: no stack, no line breaks, a full stop at the end.
		expect(message).not.toMatch(/\n|\(.+:\d+:\d+\)/);
		expect(message).toMatch(/\.$/);
		return message;
	} finally {
		await store?.close();
	}
}

describe('the S3 start-up check', () => {
	it('passes with the right bucket and key, and leaves nothing behind', async () => {
		expect(await startUp({})).toBeNull();
		const store = new S3Storage(s3Settings(good()));
		const left = [];
		for await (const o of store.list()) left.push(o.name);
		await store.close();
		expect(left).toEqual([]);
	});

	it('names S3_BUCKET when the bucket is missing or not given', async () => {
		expect(await startUp({ bucket: 'no-such-bucket' })).toBe(
			`S3_BUCKET "no-such-bucket" does not exist at ${fake.endpoint}.`
		);
		expect(await startUp({ bucket: '' })).toMatch(/^S3_BUCKET is not set/);
	});

	it('names the key variables when the credentials are refused or half given', async () => {
		expect(await startUp({ accessKeyId: 'NOT-A-KEY' })).toMatch(
			/^S3_ACCESS_KEY_ID \/ S3_SECRET_ACCESS_KEY are not accepted for S3_BUCKET "beadline-test"/
		);
		expect(await startUp({ secretAccessKey: '' })).toMatch(/^S3_SECRET_ACCESS_KEY is not set/);
		expect(await startUp({ accessKeyId: '' })).toMatch(/^S3_ACCESS_KEY_ID is not set/);
		// s3rver checks the key id but not SigV4 signatures: a wrong secret is refused by a real
		// service as SignatureDoesNotMatch, worded like this.
		const s = s3Settings(good());
		const refused = Object.assign(new Error('sig'), {
			name: 'SignatureDoesNotMatch',
			$metadata: { httpStatusCode: 403 }
		});
		expect(explainS3Failure(refused, s, 'writing a test object').message).toMatch(
			/^S3_ACCESS_KEY_ID \/ S3_SECRET_ACCESS_KEY are not accepted .*SignatureDoesNotMatch/
		);
	});

	it('names S3_ENDPOINT when nothing answers there or it is not an address', async () => {
		const dead = `http://127.0.0.1:${closedPort}`;
		expect(await startUp({ endpoint: dead })).toBe(
			`S3_ENDPOINT (${dead}) cannot be reached (ECONNREFUSED).`
		);
		expect(await startUp({ endpoint: 'localhost:9000' })).toMatch(
			/^S3_ENDPOINT is "localhost:9000"/
		);
	});

	it('names S3_REGION on AWS without one, and S3_FORCE_PATH_STYLE when it is not a yes or no', async () => {
		expect(await startUp({ endpoint: '', region: '' })).toMatch(/^S3_REGION is not set/);
		expect(await startUp({ forcePathStyle: 'maybe' })).toMatch(/^S3_FORCE_PATH_STYLE is "maybe"/);
		expect(s3Settings({ ...good(), forcePathStyle: '' }).forcePathStyle).toBe(true);
		expect(s3Settings({ ...good(), endpoint: '', forcePathStyle: '' }).forcePathStyle).toBe(false);
	});
});
