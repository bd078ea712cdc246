// npm run db:restore -- DIR [--force] — verifies a backup folder (manifest, SHA-256s, integrity,
// table digests) and puts it in place of DATABASE_FILE and UPLOADS_DIR. What was there is moved
// aside, never deleted. Refuses while another process has the database open, unless --force.
import { resolve } from 'node:path';
import { config } from '../src/lib/server/config';
import { orExit } from '../src/lib/server/config-error';
import { closeStorage, storage } from '../src/lib/server/storage/select';
import { restoreBackup } from './lib/backup';

if (config.database.kind !== 'sqlite') {
	console.error(
		"DATABASE_URL names a PostgreSQL database: npm run db:restore restores the SQLite file only; use pg_dump / pg_restore (and the bucket's own versioning) there."
	);
	process.exit(1);
}

const dir = process.argv.slice(2).find((a) => !a.startsWith('--'));
if (!dir) {
	console.error('Usage: npm run db:restore -- <backup folder> [--force]');
	process.exit(1);
}
// With STORAGE=s3 the objects go back into the bucket; nothing already there is removed.
const store = await orExit(async () => {
	const s = await storage();
	// The folder is moved aside and made anew; only a bucket has to be proven reachable first.
	if (s.kind === 's3') await s.check();
	return s;
});
const bucket = store.kind === 's3' ? store : undefined;
try {
	const { manifest, movedAside } = await restoreBackup({
		dir: resolve(dir),
		databaseFile: config.databaseFile,
		uploadsDir: config.uploadsDir,
		bucket,
		force: process.argv.includes('--force')
	});
	const rows = Object.values(manifest.database.tables).reduce((n, t) => n + t.rows, 0);
	console.log(`Restored the backup of ${manifest.createdAt} into ${config.databaseFile}`);
	console.log(
		`  ${rows} rows in ${Object.keys(manifest.database.tables).length} tables, digests match`
	);
	console.log(
		`  ${manifest.uploads.files.length} uploads into ${store.where}, SHA-256s match${bucket ? ' (objects already in the bucket were kept)' : ''}`
	);
	for (const p of movedAside) console.log(`  kept the previous ${p}`);
} catch (e) {
	console.error(e instanceof Error ? e.message : e);
	process.exit(1);
} finally {
	await closeStorage();
}
