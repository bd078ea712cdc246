// For the storage tests only: a bucket store on the S3 fake of scripts/lib/s3-fake.
import type { S3Fake } from '../../../../scripts/lib/s3-fake';
import { S3Storage } from './s3';
import { s3Settings } from './s3-settings';

/** The fake's bucket as the app would open it (the fake's fixed keys, path-style by default). */
export function fakeBucket(fake: S3Fake): S3Storage {
	return new S3Storage(
		s3Settings({
			bucket: fake.bucket,
			region: '',
			endpoint: fake.endpoint,
			accessKeyId: 'S3RVER',
			secretAccessKey: 'S3RVER',
			forcePathStyle: ''
		})
	);
}
