// The S3_* variables, checked before any client is made: each problem is one sentence naming
// the variable. No SDK import here, so the check is cheap and unit-testable on its own.
import { config } from '../config';
import { ConfigError } from '../config-error';

export interface S3Settings {
	bucket: string;
	region: string;
	/** Empty: AWS itself, found from the region. */
	endpoint: string;
	/** Null: the SDK's standard chain (AWS_ACCESS_KEY_ID…, a profile, an instance role). */
	credentials: { accessKeyId: string; secretAccessKey: string } | null;
	forcePathStyle: boolean;
}

function flag(name: string, value: string, fallback: boolean): boolean {
	if (value === '') return fallback;
	if (/^(1|true|yes|on)$/i.test(value)) return true;
	if (/^(0|false|no|off)$/i.test(value)) return false;
	throw new ConfigError(`${name} is "${value}"; it must be true or false.`);
}

export function s3Settings(raw = config.s3): S3Settings {
	if (!raw.bucket)
		throw new ConfigError('S3_BUCKET is not set; STORAGE=s3 needs the name of a bucket.');
	if (raw.endpoint) {
		let url: URL | null = null;
		try {
			url = new URL(raw.endpoint);
		} catch {
			// reported below
		}
		if (!url || !/^https?:$/.test(url.protocol))
			throw new ConfigError(
				`S3_ENDPOINT is "${raw.endpoint}"; it must be an http:// or https:// address.`
			);
	}
	// S3-compatible services mostly ignore the region, but the SDK signs with one.
	const region = raw.region || (raw.endpoint ? 'us-east-1' : '');
	if (!region)
		throw new ConfigError('S3_REGION is not set; STORAGE=s3 on AWS needs the bucket’s region.');
	if (!!raw.accessKeyId !== !!raw.secretAccessKey)
		throw new ConfigError(
			raw.accessKeyId
				? 'S3_SECRET_ACCESS_KEY is not set, but S3_ACCESS_KEY_ID is; give both or neither.'
				: 'S3_ACCESS_KEY_ID is not set, but S3_SECRET_ACCESS_KEY is; give both or neither.'
		);
	return {
		bucket: raw.bucket,
		region,
		endpoint: raw.endpoint,
		credentials: raw.accessKeyId
			? { accessKeyId: raw.accessKeyId, secretAccessKey: raw.secretAccessKey }
			: null,
		// Most S3-compatible services (and s3rver) want path-style addresses.
		forcePathStyle: flag('S3_FORCE_PATH_STYLE', raw.forcePathStyle, !!raw.endpoint)
	};
}
