// Every piece of SQL that differs between SQLite (the embedded default) and PostgreSQL (the hosted
// path) lives here, so the services and migrations stay one code path. Rules:
// - What a function does on SQLite is exactly what the code did before PostgreSQL existed
//   (shipped migrations must leave a SQLite file byte-for-byte the same; see DEVELOPERS.md).
// - Callers pass the Sequelize instance (or a migration's QueryInterface) they already hold.
import {
	DataTypes,
	Op,
	QueryTypes,
	Sequelize,
	type CreationAttributes,
	type DataType,
	type Model,
	type ModelStatic,
	type QueryInterface,
	type Transaction,
	type WhereOptions
} from 'sequelize';

export type Dialect = 'sqlite' | 'postgres';

type Db = Sequelize | QueryInterface;
const seq = (db: Db): Sequelize => ('getQueryInterface' in db ? db : db.sequelize);

export function dialectOf(db: Db): Dialect {
	const d = seq(db).getDialect();
	if (d !== 'sqlite' && d !== 'postgres') throw new Error(`Unsupported dialect ${d}`);
	return d;
}

export const isPostgres = (db: Db) => dialectOf(db) === 'postgres';

// ---- migrations --------------------------------------------------------------------------------

/**
 * A floating-point column. SQLite's REAL is 8 bytes; PostgreSQL's REAL is 4 (about 7 digits), so
 * there it is DOUBLE PRECISION: a value copied from SQLite comes back the same.
 */
export function realType(q: QueryInterface): DataType {
	return isPostgres(q) ? DataTypes.DOUBLE : DataTypes.REAL;
}

/**
 * Makes `table` append-only: UPDATE and DELETE raise an error whose text is `message` (the
 * tests look for "append-only"). On SQLite, `layout` is the whitespace between the two lines of
 * the CREATE TRIGGER text as migrations 0001 and 0004 shipped it, kept so sqlite_master stays
 * byte-for-byte the same. On PostgreSQL one plpgsql function raises for every such table.
 */
export async function appendOnly(
	q: QueryInterface,
	table: string,
	message: string,
	layout: string
): Promise<void> {
	if (!isPostgres(q)) {
		for (const [what, op] of [
			['update', 'UPDATE'],
			['delete', 'DELETE']
		])
			await q.sequelize.query(
				`CREATE TRIGGER ${table}_no_${what} BEFORE ${op} ON ${table}${layout}BEGIN SELECT RAISE(ABORT, '${message}'); END`
			);
		return;
	}
	await q.sequelize.query(`CREATE OR REPLACE FUNCTION beadline_append_only() RETURNS trigger
		LANGUAGE plpgsql AS $$ BEGIN RAISE EXCEPTION '%', TG_ARGV[0] USING ERRCODE = 'restrict_violation'; END $$`);
	for (const op of ['UPDATE', 'DELETE'])
		await q.sequelize.query(
			`CREATE TRIGGER ${table}_no_${op.toLowerCase()} BEFORE ${op} ON ${table}
			 FOR EACH ROW EXECUTE FUNCTION beadline_append_only('${message}')`
		);
}

/** Before the migrations: WAL on SQLite (it persists in the file). */
export async function beforeMigrations(s: Sequelize): Promise<void> {
	if (!isPostgres(s)) await s.query('PRAGMA journal_mode=WAL');
}

/**
 * After the migrations. SQLite's advice for a long-lived connection: refresh the planner's
 * statistics where missing or stale, with a bounded sample so a large file still starts quickly.
 * PostgreSQL's autovacuum keeps its statistics itself.
 */
export async function afterMigrations(s: Sequelize): Promise<void> {
	if (isPostgres(s)) return;
	await s.query('PRAGMA analysis_limit=1000');
	await s.query('PRAGMA optimize=0x10002');
}

/** Any fixed number: identifies Beadline's migration lock among a cluster's advisory locks. */
const MIGRATION_LOCK = 731_204_912;

/**
 * Runs `work` (the migrations) while holding a cluster-wide lock on PostgreSQL, so several
 * processes starting at once migrate one after another and the later ones find nothing to do.
 * The lock is held by a transaction of its own; the migrations run on other connections.
 */
export async function withMigrationLock<T>(s: Sequelize, work: () => Promise<T>): Promise<T> {
	if (!isPostgres(s)) return work();
	return s.transaction(async (t) => {
		await s.query(`SELECT pg_advisory_xact_lock(${MIGRATION_LOCK})`, { transaction: t });
		return work();
	});
}

// ---- queries -----------------------------------------------------------------------------------

/** LIKE as SQLite has it: case-insensitive for ASCII. PostgreSQL's LIKE is case-sensitive. */
export function likeOp(s: Sequelize): typeof Op.like | typeof Op.iLike {
	return isPostgres(s) ? Op.iLike : Op.like;
}

/**
 * `column = value` written so SQLite will not answer it from an index (`+"column"`), which lets
 * a sorted page walk the sort's index and stop early. PostgreSQL's planner weighs both plans on
 * its own statistics and has no such hint (and no unary + on text): the plain column.
 */
export function unindexedTerm<M extends Model>(
	s: Sequelize,
	field: string,
	value: unknown
): WhereOptions<M> {
	const column = isPostgres(s) ? `"${field}"` : `+"${field}"`;
	return Sequelize.where(Sequelize.literal(column), value as never) as never;
}

/**
 * Inserts one row unless a unique index already holds its key; true when it was inserted.
 * SQLite: INSERT OR IGNORE, then changes(). PostgreSQL: ON CONFLICT DO NOTHING RETURNING id
 * (no row back when it was ignored).
 */
export async function insertUnlessDuplicate<M extends Model>(
	model: ModelStatic<M>,
	row: CreationAttributes<M>,
	t: Transaction
): Promise<boolean> {
	const s = model.sequelize!;
	if (isPostgres(s)) {
		const [made] = await model.bulkCreate([row], {
			ignoreDuplicates: true,
			returning: ['id'] as never,
			transaction: t
		});
		return made?.get('id') != null;
	}
	await model.bulkCreate([row], { ignoreDuplicates: true, transaction: t });
	const [{ n }] = (await s.query('SELECT changes() AS n', {
		type: QueryTypes.SELECT,
		transaction: t
	})) as [{ n: number }];
	return n > 0;
}

/** Every (table, column) whose column name ends in `_key`: where storage keys are kept. */
export async function keyColumns(s: Sequelize): Promise<Array<{ t: string; c: string }>> {
	const sql = isPostgres(s)
		? `SELECT table_name AS t, column_name AS c FROM information_schema.columns
		   WHERE table_schema = current_schema() AND column_name LIKE '%\\_key' ESCAPE '\\'`
		: `SELECT m.name AS t, p.name AS c FROM sqlite_master m, pragma_table_info(m.name) p
		 WHERE m.type = 'table' AND p.name LIKE '%\\_key' ESCAPE '\\'`;
	return s.query<{ t: string; c: string }>(sql, { type: QueryTypes.SELECT });
}

/** The user tables of the database (not the engine's own). */
export async function tableNames(s: Sequelize): Promise<string[]> {
	const sql = isPostgres(s)
		? `SELECT table_name AS name FROM information_schema.tables
		   WHERE table_schema = current_schema() AND table_type = 'BASE TABLE' ORDER BY table_name`
		: "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name";
	const rows = await s.query<{ name: string }>(sql, { type: QueryTypes.SELECT });
	return rows.map((r) => r.name);
}

/**
 * After rows were inserted with their ids (db:copy): PostgreSQL's sequences must move past the
 * highest id, or the next insert would collide. SQLite's AUTOINCREMENT follows by itself.
 */
export async function resetSequences(
	s: Sequelize,
	tables: string[],
	t?: Transaction
): Promise<void> {
	if (!isPostgres(s)) return;
	const serials = await s.query<{ t: string; seq: string | null }>(
		`SELECT table_name AS t, pg_get_serial_sequence(quote_ident(table_name), 'id') AS seq
		 FROM information_schema.columns WHERE table_schema = current_schema() AND column_name = 'id'`,
		{ type: QueryTypes.SELECT, transaction: t }
	);
	for (const { t: table, seq } of serials) {
		if (!seq || !tables.includes(table)) continue;
		await s.query(
			`SELECT setval('${seq}', COALESCE((SELECT MAX(id) FROM "${table}"), 0) + 1, false)`,
			{ transaction: t }
		);
	}
}

// ---- errors ------------------------------------------------------------------------------------

/** PostgreSQL's SQLSTATE on a driver error, wrapped or not. */
export function sqlState(e: unknown): string | undefined {
	const err = e as { parent?: { code?: unknown }; original?: { code?: unknown }; code?: unknown };
	const code = err?.parent?.code ?? err?.original?.code ?? err?.code;
	return typeof code === 'string' ? code : undefined;
}

/** Serialization failure or deadlock: the transaction did nothing and may simply run again. */
export function isRetryableConflict(e: unknown): boolean {
	const code = sqlState(e);
	return code === '40001' || code === '40P01';
}
