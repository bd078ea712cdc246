// npm run db:backup [-- --out DIR] — an online backup of DATABASE_FILE and UPLOADS_DIR while the
// server keeps running: the SQLite backup API, then a copy of the uploads, then a manifest.
import { join, resolve } from 'node:path';
import { config } from '../src/lib/server/config';
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
const m = await createBackup({
	databaseFile: config.databaseFile,
	uploadsDir: config.uploadsDir,
	outDir
});
const rows = Object.values(m.database.tables).reduce((n, t) => n + t.rows, 0);
console.log(`Backup written to ${outDir} in ${m.seconds.toFixed(2)} s`);
console.log(
	`  database: ${(m.database.bytes / 1048576).toFixed(1)} MB, ${Object.keys(m.database.tables).length} tables, ${rows} rows, sha256 ${m.database.sha256.slice(0, 16)}…`
);
console.log(
	`  uploads: ${m.uploads.files.length} files, ${(m.uploads.bytes / 1048576).toFixed(1)} MB; ${m.uploads.referenced} referenced by the database`
);
if (m.uploads.missing.length) {
	// The backup is kept, but a file the data names was already gone from UPLOADS_DIR.
	console.error(`  MISSING from UPLOADS_DIR: ${m.uploads.missing.join(', ')}`);
	process.exit(2);
}
