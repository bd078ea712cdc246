// s3rver ships no types; the little of it the fake uses.
declare module 's3rver' {
	import type { Server } from 'node:http';
	interface S3rverOptions {
		port?: number;
		address?: string;
		directory: string;
		silent?: boolean;
		resetOnClose?: boolean;
		configureBuckets?: { name: string }[];
	}
	export default class S3rver {
		constructor(options: S3rverOptions);
		run(): Promise<{ address: string; port: number }>;
		close(): Promise<void>;
		httpServer?: Server;
	}
}
