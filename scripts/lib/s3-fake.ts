// A throw-away S3-compatible bucket for tests and for trying STORAGE=s3 out: s3rver in this
// process, on a free port, keeping its objects in a temporary folder. s3rver accepts the
// access key S3RVER with the secret S3RVER; anything else is refused as a real service would.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import S3rver from 's3rver';

export const FAKE_KEY = 'S3RVER';

export interface S3Fake {
	endpoint: string;
	bucket: string;
	directory: string;
	/** The variables that point Beadline at this bucket. */
	env: Record<string, string>;
	close(): Promise<void>;
}

export async function startS3Fake(
	opts: { bucket?: string; buckets?: string[]; directory?: string } = {}
): Promise<S3Fake> {
	const bucket = opts.bucket ?? 'beadline-test';
	const directory = opts.directory ?? mkdtempSync(join(tmpdir(), 'beadline-s3-'));
	const server = new S3rver({
		port: 0,
		address: '127.0.0.1',
		directory,
		silent: true,
		configureBuckets: [bucket, ...(opts.buckets ?? [])].map((name) => ({ name }))
	});
	const { port } = await server.run();
	const endpoint = `http://127.0.0.1:${port}`;
	return {
		endpoint,
		bucket,
		directory,
		env: {
			STORAGE: 's3',
			S3_BUCKET: bucket,
			S3_REGION: 'us-east-1',
			S3_ENDPOINT: endpoint,
			S3_ACCESS_KEY_ID: FAKE_KEY,
			S3_SECRET_ACCESS_KEY: FAKE_KEY,
			S3_FORCE_PATH_STYLE: 'true'
		},
		async close() {
			await server.close();
			if (!opts.directory) rmSync(directory, { recursive: true, force: true });
		}
	};
}
