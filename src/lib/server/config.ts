import { resolve } from 'node:path';
import { parseDatabaseUrl, type DatabaseTarget } from './db/database-url';

// One place that reads the environment. Plain process.env (not $env) so the same modules run
// under the app, under vitest and under the command-line scripts in scripts/.
function read(name: string, fallback: string): string {
	const value = process.env[name];
	return value === undefined || value === '' ? fallback : value;
}

export const config = {
	/** DATABASE_URL (postgres://… or sqlite:…); unset means the SQLite file of DATABASE_FILE. */
	get database(): DatabaseTarget {
		return parseDatabaseUrl(process.env.DATABASE_URL, process.env.DATABASE_FILE);
	},
	/** The SQLite file in use (DATABASE_URL=sqlite:… or DATABASE_FILE), for the SQLite-only tools. */
	get databaseFile() {
		const db = this.database;
		return db.kind === 'sqlite'
			? db.file
			: resolve(read('DATABASE_FILE', './data/beadline.sqlite'));
	},
	get dataDir() {
		return resolve(read('DATA_DIR', './data'));
	},
	get uploadsDir() {
		return resolve(read('UPLOADS_DIR', './data/uploads'));
	},
	/** STORAGE: `local` (the default, UPLOADS_DIR) or `s3` (the S3_* variables). */
	get storage() {
		return read('STORAGE', 'local').toLowerCase();
	},
	/** Raw S3 settings; storage/s3-settings.ts checks them. Credentials may also be AWS_*. */
	get s3() {
		return {
			bucket: read('S3_BUCKET', ''),
			region: read('S3_REGION', read('AWS_REGION', '')),
			endpoint: read('S3_ENDPOINT', ''),
			accessKeyId: read('S3_ACCESS_KEY_ID', ''),
			secretAccessKey: read('S3_SECRET_ACCESS_KEY', ''),
			forcePathStyle: read('S3_FORCE_PATH_STYLE', '')
		};
	},
	get smtpUrl() {
		return read('SMTP_URL', 'smtp://127.0.0.1:2525');
	},
	get mailFrom() {
		return read('MAIL_FROM', 'Beadline <no-reply@beadline.invalid>');
	},
	/** Where the local mail catcher keeps what it caught; empty when no catcher runs. */
	get mailCatcherDir() {
		return process.env.MAIL_CATCHER_DIR ? resolve(process.env.MAIL_CATCHER_DIR) : '';
	},
	get origin() {
		return read('ORIGIN', 'http://localhost:5173');
	},
	/** BEADLINE_DEMO=1 (set by `npm run demo`): a database the demo passwords may be seeded into. */
	get isDemo() {
		return process.env.BEADLINE_DEMO === '1';
	},
	get nodeEnv() {
		return process.env.NODE_ENV;
	}
};
