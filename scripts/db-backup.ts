// npm run db:backup [-- --out DIR] — an online backup of DATABASE_FILE and the uploads while the
// server keeps running: the SQLite backup API, then a copy of every stored upload (UPLOADS_DIR,
// or with STORAGE=s3 every object of the bucket, downloaded into the folder), then a manifest.
import { join, resolve } from 'node:path';
import { config } from '../src/lib/server/config';
import { orExit } from '../src/lib/server/config-error';
import { checkStorage, closeStorage } from '../src/lib/server/storage/select';
import { createBackup } from './lib/backup';

if (config.database.kind !== 'sqlite') {
	console.error(
		"DATABASE_URL names a PostgreSQL database: npm run db:backup backs up the SQLite file only; use pg_dump / pg_restore (and the bucket's own versioning) there."
	);
	process.exit(1);
}

function argValue(name: string): string | undefined {
	const i = process.argv.indexOf(name);
	return i >= 0 ? process.argv[i + 1] : undefined;
}

const stamp = new Date().toISOString().replace(/[:.]/g, '-');
const outDir = resolve(argValue('--out') ?? join('backups', `beadline-${stamp}`));
const uploads = await orExit(checkStorage);
const m = await createBackup({
	databaseFile: config.databaseFile,
	uploadsDir: config.uploadsDir,
	uploads,
	outDir
});
await closeStorage();
const rows = Object.values(m.database.tables).reduce((n, t) => n + t.rows, 0);
console.log(`Backup written to ${outDir} in ${m.seconds.toFixed(2)} s`);
console.log(
	`  database: ${(m.database.bytes / 1048576).toFixed(1)} MB, ${Object.keys(m.database.tables).length} tables, ${rows} rows, sha256 ${m.database.sha256.slice(0, 16)}…`
);
console.log(
	`  uploads: ${m.uploads.files.length} files copied from ${uploads.where}, ${(m.uploads.bytes / 1048576).toFixed(1)} MB; ${m.uploads.referenced} referenced by the database`
);
if (uploads.kind === 's3')
	console.log(
		'  (STORAGE=s3: every object was downloaded into this folder; bucket versioning is not a backup of the database.)'
	);
if (m.uploads.missing.length) {
	// The backup is kept, but a file the data names was already gone from the store.
	console.error(`  MISSING from ${uploads.where}: ${m.uploads.missing.join(', ')}`);
	process.exit(2);
}
