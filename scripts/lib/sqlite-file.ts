// A thin promise wrapper over one raw sqlite3 connection, for the command-line tools and tests
// that read or copy a database file without the app's Sequelize models (backup, restore, bench
// seeding, fault checks).
import sqlite3 from 'sqlite3';

export type Row = Record<string, unknown>;

export interface SqliteFile {
	db: sqlite3.Database;
	all<T = Row>(sql: string, params?: unknown[]): Promise<T[]>;
	get<T = Row>(sql: string, params?: unknown[]): Promise<T | undefined>;
	run(sql: string, params?: unknown[]): Promise<void>;
	exec(sql: string): Promise<void>;
	close(): Promise<void>;
}

export function openSqlite(
	file: string,
	opts: { readonly?: boolean; mustExist?: boolean; busyMs?: number } = {}
): Promise<SqliteFile> {
	const mode = opts.readonly
		? sqlite3.OPEN_READONLY
		: sqlite3.OPEN_READWRITE | (opts.mustExist ? 0 : sqlite3.OPEN_CREATE);
	return new Promise((resolve, reject) => {
		const db = new sqlite3.Database(file, mode, (err) => {
			if (err) return reject(err);
			db.configure('busyTimeout', opts.busyMs ?? 5000);
			const cb =
				<T>(ok: (v: T) => void, ko: (e: Error) => void) =>
				(e: Error | null, v: T) =>
					e ? ko(e) : ok(v);
			resolve({
				db,
				all: (sql, params = []) => new Promise((ok, ko) => db.all(sql, params, cb(ok, ko))),
				get: (sql, params = []) => new Promise((ok, ko) => db.get(sql, params, cb(ok, ko))),
				run: (sql, params = []) =>
					new Promise((ok, ko) => db.run(sql, params, (e: Error | null) => (e ? ko(e) : ok()))),
				exec: (sql) => new Promise((ok, ko) => db.exec(sql, (e) => (e ? ko(e) : ok()))),
				close: () => new Promise((ok, ko) => db.close((e) => (e ? ko(e) : ok())))
			});
		});
	});
}

interface Backup {
	step(pages: number, cb: (err: Error | null) => void): void;
	finish(cb: (err: Error | null) => void): void;
	readonly completed: boolean;
	readonly failed: boolean;
}

/** Copies a live database with SQLite's online backup API: a consistent snapshot, WAL included. */
export async function backupTo(source: string, dest: string): Promise<void> {
	// Read-write without create: a read-only handle cannot always join a WAL file's shared memory.
	const src = await openSqlite(source, { mustExist: true });
	try {
		const backup = (src.db as unknown as { backup(file: string): Backup }).backup(dest);
		const step = () => new Promise<Error | null>((ok) => backup.step(-1, (e) => ok(e)));
		// One step of all pages copies under one read transaction; a busy destination is retried.
		for (let tries = 0; !backup.completed; tries++) {
			const err = await step();
			if (backup.failed || (err && tries > 50)) throw err ?? new Error('backup failed');
			if (err) await new Promise((r) => setTimeout(r, 100));
		}
		await new Promise<void>((ok, ko) => backup.finish((e) => (e ? ko(e) : ok())));
	} finally {
		await src.close();
	}
}

/** True when another connection has the file open (a running server keeps one), by trying for
 * an exclusive lock without waiting. */
export async function inUse(file: string): Promise<boolean> {
	const db = await openSqlite(file, { busyMs: 0 });
	try {
		await db.exec('PRAGMA locking_mode=EXCLUSIVE; BEGIN EXCLUSIVE; COMMIT;');
		return false;
	} catch (e) {
		if (/SQLITE_BUSY|locked/i.test(String(e))) return true;
		throw e;
	} finally {
		await db.close();
	}
}
