// Uploads in an S3-compatible bucket (STORAGE=s3). Loaded only through select.ts's dynamic
// import, so the SDK costs nothing on the default path. A PutObject (or lib-storage's Upload,
// which completes a multipart upload only when every part is in) is all or nothing: no reader
// sees half an object, and no `.part` objects exist.
import { randomBytes } from 'node:crypto';
import type { Readable } from 'node:stream';
import {
	DeleteObjectCommand,
	GetObjectCommand,
	HeadBucketCommand,
	HeadObjectCommand,
	paginateListObjectsV2,
	S3Client
} from '@aws-sdk/client-s3';
import { Upload } from '@aws-sdk/lib-storage';
import { ConfigError } from '../config-error';
import { assertName, type StorageBackend, type StoredObject } from './backend';
import { s3Settings, type S3Settings } from './s3-settings';

// The SDK warns at its first client that its releases after January 2027 need Node 22. The
// installed version works on Node 20 and the lock file keeps it; the README says so for the day
// it is updated. Without this, the warning's eight lines would bury a start-up sentence.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';

const TYPES: Record<string, string> = {
	jpg: 'image/jpeg',
	png: 'image/png',
	pdf: 'application/pdf'
};

interface SdkError {
	name?: string;
	code?: string;
	message?: string;
	$metadata?: { httpStatusCode?: number };
}

const statusOf = (e: unknown) => (e as SdkError)?.$metadata?.httpStatusCode;
const isMissing = (e: unknown) =>
	statusOf(e) === 404 || ['NoSuchKey', 'NotFound'].includes((e as SdkError)?.name ?? '');

/** The network-level cause of a failed request, if that is what it was. */
function networkCause(e: unknown): string | null {
	const err = e as SdkError & { cause?: SdkError };
	const code = err?.code ?? err?.cause?.code;
	if (code && /^E[A-Z_]+$/.test(code)) return code;
	if (err?.name === 'TimeoutError') return 'timed out';
	return null;
}

/** One sentence naming the variable, for what a start-up request ran into. */
export function explainS3Failure(e: unknown, s: S3Settings, step: string): ConfigError {
	const where = s.endpoint || `AWS region ${s.region}`;
	const net = networkCause(e);
	if (net)
		return new ConfigError(
			s.endpoint
				? `S3_ENDPOINT (${s.endpoint}) cannot be reached (${net}).`
				: `S3_REGION (${s.region}): the AWS S3 endpoint cannot be reached (${net}).`
		);
	const status = statusOf(e);
	// A HEAD has no body to name the error: the SDK then says "Unknown"; the status says more.
	const raw = (e as SdkError)?.name ?? '';
	const name = raw === 'Unknown' || raw === 'Error' ? '' : raw;
	if (name === 'CredentialsProviderError' || /credential/i.test((e as SdkError)?.message ?? ''))
		if (!status)
			return new ConfigError(
				'S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY are not set and the SDK found no AWS credentials.'
			);
	if (status === 404 || name === 'NoSuchBucket' || name === 'NotFound')
		return new ConfigError(`S3_BUCKET "${s.bucket}" does not exist at ${where}.`);
	const keyVar = s.credentials ? 'S3_ACCESS_KEY_ID / S3_SECRET_ACCESS_KEY' : 'the AWS credentials';
	if (
		status === 403 ||
		['InvalidAccessKeyId', 'SignatureDoesNotMatch', 'AccessDenied'].includes(name)
	)
		return new ConfigError(
			`${keyVar} are not accepted for S3_BUCKET "${s.bucket}" at ${where} (${name || `HTTP ${status}`} while ${step}).`
		);
	if (status === 301 || name === 'PermanentRedirect')
		return new ConfigError(`S3_REGION (${s.region}) is not the region of S3_BUCKET "${s.bucket}".`);
	return new ConfigError(
		`S3_BUCKET "${s.bucket}" at ${where} answered ${name || (status ? `HTTP ${status}` : 'with an error')} while ${step}.`
	);
}

export class S3Storage implements StorageBackend {
	readonly kind = 's3';
	readonly client: S3Client;

	constructor(readonly settings: S3Settings) {
		this.client = new S3Client({
			region: settings.region,
			...(settings.endpoint ? { endpoint: settings.endpoint } : {}),
			forcePathStyle: settings.forcePathStyle,
			...(settings.credentials ? { credentials: settings.credentials } : {}),
			// A dead endpoint must fail start-up in seconds, not hang it.
			requestHandler: { connectionTimeout: 5_000, requestTimeout: 60_000 },
			maxAttempts: 3
		});
	}

	get where() {
		return `s3://${this.settings.bucket}`;
	}

	private get bucket() {
		return this.settings.bucket;
	}

	async put(name: string, body: Uint8Array | Readable): Promise<void> {
		assertName(name);
		const ext = name.split('.').pop() ?? '';
		// lib-storage streams a body of unknown length in parts; a small one is a single PUT.
		await new Upload({
			client: this.client,
			params: {
				Bucket: this.bucket,
				Key: name,
				Body: body,
				ContentType: TYPES[ext] ?? 'application/octet-stream'
			}
		}).done();
	}

	async get(name: string): Promise<{ body: Readable; bytes: number } | null> {
		assertName(name);
		try {
			const r = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: name }));
			if (!r.Body) return null;
			return { body: r.Body as Readable, bytes: Number(r.ContentLength ?? 0) };
		} catch (e) {
			if (isMissing(e)) return null;
			throw e;
		}
	}

	async exists(name: string): Promise<boolean> {
		assertName(name);
		try {
			await this.client.send(new HeadObjectCommand({ Bucket: this.bucket, Key: name }));
			return true;
		} catch (e) {
			if (isMissing(e)) return false;
			throw e;
		}
	}

	async delete(name: string): Promise<void> {
		assertName(name);
		await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: name }));
	}

	async *list(prefix = ''): AsyncIterable<StoredObject> {
		const pages = paginateListObjectsV2(
			{ client: this.client },
			{ Bucket: this.bucket, ...(prefix ? { Prefix: prefix } : {}) }
		);
		for await (const page of pages)
			for (const o of page.Contents ?? [])
				if (o.Key)
					yield {
						name: o.Key,
						bytes: Number(o.Size ?? 0),
						modified: o.LastModified ?? new Date(0)
					};
	}

	/** The bucket answers, takes the credentials and accepts a write (then the probe goes). */
	async check(): Promise<void> {
		const probe = `beadline-check/${randomBytes(8).toString('hex')}`;
		let step = 'looking up the bucket';
		try {
			await this.client.send(new HeadBucketCommand({ Bucket: this.bucket }));
			step = 'writing a test object';
			await this.put(probe, Buffer.from('start-up check\n'));
			step = 'deleting the test object';
			await this.delete(probe);
		} catch (e) {
			throw explainS3Failure(e, this.settings, step);
		}
	}

	async close(): Promise<void> {
		this.client.destroy();
	}
}

export function s3FromEnv(): S3Storage {
	return new S3Storage(s3Settings());
}
