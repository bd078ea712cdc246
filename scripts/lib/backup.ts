// Backup and restore of one Beadline installation: the SQLite file (online backup API, so the
// server may keep running) and the uploads folder, with a manifest of SHA-256s, row counts and a
// digest of every table, so that a restore can prove it brought back exactly what was saved.
import { createHash } from 'node:crypto';
import { createReadStream, createWriteStream, existsSync } from 'node:fs';
import { copyFile, mkdir, readdir, readFile, rename, stat, writeFile } from 'node:fs/promises';
import { dirname, join, relative, sep } from 'node:path';
import { pipeline } from 'node:stream/promises';
import type { StorageBackend } from '../../src/lib/server/storage/backend';
import { LocalStorage } from '../../src/lib/server/storage/local';
import { backupTo, inUse, openSqlite, type SqliteFile } from './sqlite-file';

export const MANIFEST = 'manifest.json';
export const DB_NAME = 'beadline.sqlite';
/** The storage keys of src/lib/server/storage: random hex, a kind, an optional thumbnail mark. */
const UPLOAD_KEY = /^[0-9a-f]{32}(-t)?\.(jpg|png|pdf)$/;

export interface TableSummary {
	rows: number;
	sha256: string;
}

export interface FileEntry {
	path: string;
	bytes: number;
	sha256: string;
}

export interface Manifest {
	format: 1;
	createdAt: string;
	seconds: number;
	database: { file: string; bytes: number; sha256: string; tables: Record<string, TableSummary> };
	uploads: { files: FileEntry[]; bytes: number; referenced: number; missing: string[] };
}

export function sha256File(path: string): Promise<string> {
	return new Promise((resolve, reject) => {
		const hash = createHash('sha256');
		createReadStream(path)
			.on('data', (c) => hash.update(c))
			.on('error', reject)
			.on('end', () => resolve(hash.digest('hex')));
	});
}

/** Row count and a SHA-256 over every row in rowid order, per table (the data, not the pages). */
export async function tableSummaries(db: SqliteFile): Promise<Record<string, TableSummary>> {
	const tables = await db.all<{ name: string; sql: string | null }>(
		"SELECT name, sql FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name"
	);
	const out: Record<string, TableSummary> = {};
	for (const { name, sql } of tables) {
		const hash = createHash('sha256');
		let rows = 0;
		// A WITHOUT ROWID table (the search index's shadow tables) has no rowid: every column orders it.
		const order = /without\s+rowid/i.test(sql ?? '')
			? (await db.all<{ name: string }>(`SELECT name FROM pragma_table_info('${name}')`))
					.map((c) => `"${c.name}"`)
					.join(', ')
			: 'rowid';
		await new Promise<void>((resolve, reject) => {
			db.db.each(
				`SELECT * FROM "${name}" ORDER BY ${order}`,
				(err: Error | null, row: Record<string, unknown>) => {
					if (err) return reject(err);
					rows++;
					hash.update(JSON.stringify(Object.values(row)) + '\n');
				},
				(err: Error | null) => (err ? reject(err) : resolve())
			);
		});
		out[name] = { rows, sha256: hash.digest('hex') };
	}
	return out;
}

/** Every storage key the database refers to: values of any `*_key` column that look like one. */
export async function referencedUploads(db: SqliteFile): Promise<Set<string>> {
	const cols = await db.all<{ t: string; c: string }>(
		`SELECT m.name AS t, p.name AS c FROM sqlite_master m, pragma_table_info(m.name) p
		 WHERE m.type = 'table' AND p.name LIKE '%\\_key' ESCAPE '\\'`
	);
	const keys = new Set<string>();
	for (const { t, c } of cols) {
		const rows = await db.all<{ k: unknown }>(
			`SELECT "${c}" AS k FROM "${t}" WHERE "${c}" IS NOT NULL`
		);
		for (const { k } of rows) if (typeof k === 'string' && UPLOAD_KEY.test(k)) keys.add(k);
	}
	return keys;
}

/** Files under `dir`, relative, with `/` separators; `.part` files are uploads still in flight. */
export async function listFiles(
	dir: string,
	opts: { withParts?: boolean } = {}
): Promise<string[]> {
	if (!existsSync(dir)) return [];
	const entries = await readdir(dir, { recursive: true, withFileTypes: true });
	return entries
		.filter((e) => e.isFile() && (opts.withParts || !e.name.endsWith('.part')))
		.map((e) => relative(dir, join(e.parentPath, e.name)).split(sep).join('/'))
		.sort();
}

export const keyOfPath = (path: string) => path.split('/').pop() ?? path;

export async function integrity(db: SqliteFile): Promise<string[]> {
	const rows = await db.all<{ integrity_check: string }>('PRAGMA integrity_check');
	const fk = await db.all('PRAGMA foreign_key_check');
	const problems = rows.map((r) => r.integrity_check).filter((r) => r !== 'ok');
	return [...problems, ...fk.map((r) => `foreign key: ${JSON.stringify(r)}`)];
}

/** Every object of a store, copied into `dir` under its name (the same layout as UPLOADS_DIR). */
async function copyObjects(store: StorageBackend, dir: string): Promise<FileEntry[]> {
	const files: FileEntry[] = [];
	for await (const o of store.list()) {
		// In-flight writes and the start-up check's probe were never anyone's upload.
		if (o.name.endsWith('.part') || o.name.startsWith('beadline-check/')) continue;
		const found = await store.get(o.name);
		if (!found) continue; // removed meanwhile
		const to = join(dir, ...o.name.split('/'));
		await mkdir(dirname(to), { recursive: true });
		await pipeline(found.body, createWriteStream(to));
		files.push({ path: o.name, bytes: (await stat(to)).size, sha256: await sha256File(to) });
	}
	return files.sort((a, b) => (a.path < b.path ? -1 : 1));
}

/**
 * Snapshot first, uploads second: an upload is stored before the row that names it commits,
 * so every upload the snapshot refers to already exists when the store is copied. With
 * STORAGE=s3 the bucket's objects are copied into the backup folder just the same.
 */
export async function createBackup(opts: {
	databaseFile: string;
	/** The local folder; ignored when `uploads` is given. */
	uploadsDir: string;
	uploads?: StorageBackend;
	outDir: string;
}): Promise<Manifest> {
	const started = Date.now();
	if (existsSync(opts.outDir) && (await readdir(opts.outDir)).length > 0)
		throw new Error(`${opts.outDir} is not empty; give a new folder.`);
	if (!existsSync(opts.databaseFile)) throw new Error(`No database at ${opts.databaseFile}.`);
	await mkdir(join(opts.outDir, 'uploads'), { recursive: true });
	const dbCopy = join(opts.outDir, DB_NAME);
	await backupTo(opts.databaseFile, dbCopy);

	const db = await openSqlite(dbCopy, { mustExist: true });
	let tables: Record<string, TableSummary>;
	let referenced: Set<string>;
	try {
		// A self-contained single file (the server turns WAL back on at start, in migrate()).
		await db.exec('PRAGMA journal_mode=DELETE');
		const problems = await integrity(db);
		if (problems.length) throw new Error(`The snapshot fails its checks: ${problems.join('; ')}`);
		tables = await tableSummaries(db);
		referenced = await referencedUploads(db);
	} finally {
		await db.close();
	}

	const files = await copyObjects(
		opts.uploads ?? new LocalStorage(opts.uploadsDir),
		join(opts.outDir, 'uploads')
	);
	const copied = new Set(files.map((f) => keyOfPath(f.path)));
	const manifest: Manifest = {
		format: 1,
		createdAt: new Date(started).toISOString(),
		seconds: (Date.now() - started) / 1000,
		database: {
			file: DB_NAME,
			bytes: (await stat(dbCopy)).size,
			sha256: await sha256File(dbCopy),
			tables
		},
		uploads: {
			files,
			bytes: files.reduce((n, f) => n + f.bytes, 0),
			referenced: referenced.size,
			missing: [...referenced].filter((k) => !copied.has(k)).sort()
		}
	};
	// Written last: a folder without a manifest is an unfinished backup and restore refuses it.
	await writeFile(join(opts.outDir, MANIFEST), JSON.stringify(manifest, null, '\t') + '\n');
	return manifest;
}

export async function readManifest(dir: string): Promise<Manifest> {
	const path = join(dir, MANIFEST);
	if (!existsSync(path)) throw new Error(`${dir} has no ${MANIFEST}: not a finished backup.`);
	const m = JSON.parse(await readFile(path, 'utf8')) as Manifest;
	if (m.format !== 1) throw new Error(`Unknown backup format ${String(m.format)}.`);
	return m;
}

function diffTables(want: Record<string, TableSummary>, got: Record<string, TableSummary>) {
	const names = new Set([...Object.keys(want), ...Object.keys(got)]);
	return [...names]
		.filter((n) => want[n]?.sha256 !== got[n]?.sha256 || want[n]?.rows !== got[n]?.rows)
		.map(
			(n) => `table ${n}: ${want[n]?.rows ?? 'none'} rows saved, ${got[n]?.rows ?? 'none'} found`
		);
}

/** Every check a restore relies on, against the backup folder itself. Empty means sound. */
export async function verifyBackup(dir: string): Promise<string[]> {
	const m = await readManifest(dir);
	const problems: string[] = [];
	const dbFile = join(dir, m.database.file);
	if ((await sha256File(dbFile)) !== m.database.sha256) problems.push('database file changed');
	const db = await openSqlite(dbFile, { readonly: true });
	try {
		problems.push(...(await integrity(db)));
		problems.push(...diffTables(m.database.tables, await tableSummaries(db)));
	} finally {
		await db.close();
	}
	for (const f of m.uploads.files) {
		const path = join(dir, 'uploads', f.path);
		if (!existsSync(path)) problems.push(`upload ${f.path} is missing`);
		else if ((await sha256File(path)) !== f.sha256) problems.push(`upload ${f.path} changed`);
	}
	return problems;
}

async function moveAside(path: string, stamp: string): Promise<string | null> {
	if (!existsSync(path)) return null;
	const to = `${path}.before-restore-${stamp}`;
	await rename(path, to);
	return to;
}

export interface RestoreResult {
	manifest: Manifest;
	movedAside: string[];
}

/**
 * Puts a verified backup in place. What was there is moved aside, never deleted, and the stale
 * -wal/-shm files go with it: a leftover WAL applied to the restored file would corrupt it.
 */
export async function restoreBackup(opts: {
	dir: string;
	databaseFile: string;
	uploadsDir: string;
	/** A bucket (STORAGE=s3): the backup's objects are put back; nothing in it is removed. */
	bucket?: StorageBackend;
	force?: boolean;
}): Promise<RestoreResult> {
	const manifest = await readManifest(opts.dir);
	const problems = await verifyBackup(opts.dir);
	if (problems.length) throw new Error(`The backup fails its checks:\n  ${problems.join('\n  ')}`);
	if (existsSync(opts.databaseFile) && !opts.force && (await inUse(opts.databaseFile)))
		throw new Error(
			`${opts.databaseFile} is open in another process (a running server?). Stop it first, or pass --force.`
		);
	const stamp = new Date().toISOString().replace(/[:.]/g, '-');
	const movedAside: string[] = [];
	for (const path of ['', '-wal', '-shm'].map((s) => opts.databaseFile + s)) {
		const to = await moveAside(path, stamp);
		if (to) movedAside.push(to);
	}
	const uploadsAside = opts.bucket ? null : await moveAside(opts.uploadsDir, stamp);
	if (uploadsAside) movedAside.push(uploadsAside);

	await mkdir(dirname(opts.databaseFile), { recursive: true });
	const temp = `${opts.databaseFile}.restoring`;
	await copyFile(join(opts.dir, manifest.database.file), temp);
	await rename(temp, opts.databaseFile);
	for (const f of manifest.uploads.files) {
		const from = join(opts.dir, 'uploads', f.path);
		if (opts.bucket) {
			await opts.bucket.put(f.path, createReadStream(from));
			continue;
		}
		const to = join(opts.uploadsDir, f.path);
		await mkdir(dirname(to), { recursive: true });
		await copyFile(from, to);
	}
	if (!opts.bucket) await mkdir(opts.uploadsDir, { recursive: true });

	const db = await openSqlite(opts.databaseFile, { mustExist: true });
	try {
		const after = diffTables(manifest.database.tables, await tableSummaries(db));
		if (after.length) throw new Error(`The restored database differs:\n  ${after.join('\n  ')}`);
	} finally {
		await db.close();
	}
	return { manifest, movedAside };
}
