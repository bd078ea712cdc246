// Bulk data for the bench: settings records and procedures cloned from rows the app itself made
// (so every column, new ones included, holds what the models write), in big transactions of
// multi-row INSERTs through one raw connection: about 100k rows in seconds, not minutes.
import { randomUUID } from 'node:crypto';
import type { Row, SqliteFile } from '../lib/sqlite-file';

/** SQLite caps bound parameters at 32766 per statement (SQLITE_MAX_VARIABLE_NUMBER since 3.32). */
const MAX_PARAMS = 32_000;

/** The format Sequelize's SQLite dialect stores dates in. */
export const sqlDate = (d: Date) => d.toISOString().replace('T', ' ').replace('Z', ' +00:00');

async function insertMany(db: SqliteFile, table: string, rows: Row[]): Promise<void> {
	if (!rows.length) return;
	const cols = Object.keys(rows[0]!);
	const per = Math.max(1, Math.floor(MAX_PARAMS / cols.length));
	const tuple = `(${cols.map(() => '?').join(',')})`;
	const head = `INSERT INTO "${table}" (${cols.map((c) => `"${c}"`).join(',')}) VALUES `;
	for (let i = 0; i < rows.length; i += per) {
		const chunk = rows.slice(i, i + per);
		const params = chunk.flatMap((r) => cols.map((c) => r[c] ?? null));
		await db.run(head + chunk.map(() => tuple).join(','), params);
	}
}

/** Runs `work` in one IMMEDIATE transaction (waits for the server's writes, then holds the lock). */
async function inTransaction<T>(db: SqliteFile, work: () => Promise<T>): Promise<T> {
	await db.exec('BEGIN IMMEDIATE');
	try {
		const out = await work();
		await db.exec('COMMIT');
		return out;
	} catch (e) {
		await db.exec('ROLLBACK');
		throw e;
	}
}

const nextId = async (db: SqliteFile, table: string) =>
	Number((await db.get<{ n: number }>(`SELECT coalesce(max(id), 0) + 1 AS n FROM "${table}"`))!.n);

export interface BenchShop {
	shopId: number;
	name: string;
	authorIds: string[];
}

/** Shops with a few engineers each; nobody signs in to them, they only fill the tables. */
export async function addShops(db: SqliteFile, names: string[]): Promise<BenchShop[]> {
	const now = sqlDate(new Date());
	return inTransaction(db, async () => {
		const out: BenchShop[] = [];
		for (const name of names) {
			const shopId = await nextId(db, 'shops');
			await insertMany(db, 'shops', [
				{ id: shopId, name, unit_system: 'imperial', created_at: now, updated_at: now }
			]);
			const users = [1, 2, 3].map((n) => ({
				id: randomUUID(),
				shop_id: shopId,
				name: `${name} engineer ${n}`,
				email: `eng${n}.${shopId}.${Date.now()}@bench.invalid`,
				role: 'engineer',
				active: 1,
				session_version: 1,
				created_at: now,
				updated_at: now
			}));
			await insertMany(db, 'users', users);
			out.push({ shopId, name, authorIds: users.map((u) => u.id) });
		}
		return out;
	});
}

/**
 * Adds `count` settings records to a shop, cloned round-robin from `templates` (rows of
 * settings_records) with their own author, date, job and notes. One INSERT … SELECT over a
 * counter: SQLite copies the rows itself, nothing is bound per row.
 */
export async function addRecords(
	db: SqliteFile,
	shop: Pick<BenchShop, 'shopId' | 'authorIds'>,
	count: number,
	templates: Row[]
): Promise<void> {
	if (!templates.length) throw new Error('No settings records to clone: seed the demo first.');
	const cols = (
		await db.all<{ name: string }>("SELECT name FROM pragma_table_info('settings_records')")
	).map((c) => c.name);
	await db.exec('DROP TABLE IF EXISTS temp.bench_tmpl; DROP TABLE IF EXISTS temp.bench_authors');
	await db.exec(`CREATE TEMP TABLE bench_tmpl AS SELECT * FROM settings_records WHERE 0`);
	await db.exec('ALTER TABLE temp.bench_tmpl ADD COLUMN k INTEGER');
	await insertMany(
		db,
		'bench_tmpl',
		templates.map((t, k) => ({ ...t, k }))
	);
	await db.exec('CREATE TEMP TABLE bench_authors (k INTEGER PRIMARY KEY, id TEXT)');
	await insertMany(
		db,
		'bench_authors',
		shop.authorIds.map((id, k) => ({ k, id }))
	);
	// Spread over 1000 days, so date filters and sorts see a realistic spread.
	const ago = "'-' || (n.i % 1000) || ' days'";
	const stamp = `strftime('%Y-%m-%d %H:%M:%f +00:00', 'now', ${ago})`;
	const job = "'JOB-' || substr('0000' || (n.i % 997), -4)";
	const over: Record<string, string> = {
		id: 'first.id + n.i',
		shop_id: String(Number(shop.shopId)),
		author_id: 'a.id',
		welded_on: `date('now', ${ago})`,
		job_ref: job,
		notes: "'bench record ' || (first.id + n.i)",
		search_text: `t.search_text || ' ' || lower(${job}) || ' bench'`,
		frozen_at: 'NULL',
		cited_by_procedure_id: 'NULL',
		created_at: stamp,
		updated_at: stamp
	};
	const batch = 25_000;
	for (let done = 0; done < count; done += batch) {
		const size = Math.min(batch, count - done);
		await inTransaction(db, () =>
			db.run(
				`WITH RECURSIVE n(i) AS (SELECT 0 UNION ALL SELECT i + 1 FROM n WHERE i < ${size - 1}),
				 first(id) AS (SELECT coalesce(max(id), 0) + 1 FROM settings_records)
				 INSERT INTO settings_records (${cols.map((c) => `"${c}"`).join(',')})
				 SELECT ${cols.map((c) => over[c] ?? `t."${c}"`).join(',')}
				 FROM n, first
				 JOIN bench_tmpl t ON t.k = (first.id + n.i) % ${templates.length}
				 JOIN bench_authors a ON a.k = (first.id + n.i) % ${shop.authorIds.length}`
			)
		);
	}
	await db.exec('DROP TABLE temp.bench_tmpl; DROP TABLE temp.bench_authors');
}

/** Adds `count` procedures, each with one revision, cloned from a procedure the app created. */
export async function addProcedures(
	db: SqliteFile,
	shop: Pick<BenchShop, 'shopId' | 'authorIds'>,
	count: number,
	template: { procedure: Row; revision: Row },
	prefix: string
): Promise<void> {
	await inTransaction(db, async () => {
		const firstP = await nextId(db, 'procedures');
		const firstR = await nextId(db, 'procedure_revisions');
		const procedures: Row[] = [];
		const revisions: Row[] = [];
		for (let i = 0; i < count; i++) {
			const author = shop.authorIds[i % shop.authorIds.length];
			const number = `${prefix}-${String(i + 1).padStart(5, '0')}`;
			procedures.push({
				...template.procedure,
				id: firstP + i,
				shop_id: shop.shopId,
				number,
				search_text: `${number.toLowerCase()} ${String(template.procedure.search_text ?? '')}`,
				created_by_id: author
			});
			revisions.push({
				...template.revision,
				id: firstR + i,
				shop_id: shop.shopId,
				procedure_id: firstP + i,
				author_id: author,
				submitted_by_id: null
			});
		}
		await insertMany(db, 'procedures', procedures);
		await insertMany(db, 'procedure_revisions', revisions);
	});
}

export async function countRecords(db: SqliteFile, shopId?: number): Promise<number> {
	const where = shopId === undefined ? '' : ' WHERE shop_id = ?';
	const params = shopId === undefined ? [] : [shopId];
	const r = await db.get<{ n: number }>(
		`SELECT count(*) AS n FROM settings_records${where}`,
		params
	);
	return Number(r?.n ?? 0);
}
