import type { QueryInterface } from 'sequelize';
import { isPostgres } from '../dialect';

// Settings records' text search from an index, and a per-shop version of the records for caches.
// SQLite: an FTS5 table over search_text with the trigram tokenizer (substring matches, as the
// LIKE search it replaces gave), kept in step by triggers; PostgreSQL: pg_trgm's GIN index, which
// ILIKE '%word%' uses. Both: settings_record_versions, one row per shop bumped by a trigger on
// every insert, update and delete of its records, so a cache in any process can ask, with one
// primary-key read, whether what it holds is still current (src/lib/server/records/choices.ts).
// The bench's bulk inserts and any other writer go through the same triggers.

const SQLITE_UP = [
	`CREATE VIRTUAL TABLE settings_records_fts USING fts5(
		search_text, content='settings_records', content_rowid='id', tokenize='trigram')`,
	`INSERT INTO settings_records_fts(settings_records_fts) VALUES ('rebuild')`,
	`CREATE TRIGGER settings_records_fts_ai AFTER INSERT ON settings_records BEGIN
		INSERT INTO settings_records_fts(rowid, search_text) VALUES (new.id, new.search_text);
	END`,
	`CREATE TRIGGER settings_records_fts_ad AFTER DELETE ON settings_records BEGIN
		INSERT INTO settings_records_fts(settings_records_fts, rowid, search_text)
		VALUES ('delete', old.id, old.search_text);
	END`,
	`CREATE TRIGGER settings_records_fts_au AFTER UPDATE OF search_text ON settings_records BEGIN
		INSERT INTO settings_records_fts(settings_records_fts, rowid, search_text)
		VALUES ('delete', old.id, old.search_text);
		INSERT INTO settings_records_fts(rowid, search_text) VALUES (new.id, new.search_text);
	END`,
	`CREATE TABLE settings_record_versions (
		shop_id INTEGER PRIMARY KEY REFERENCES shops(id), version INTEGER NOT NULL)`,
	`INSERT INTO settings_record_versions (shop_id, version)
		SELECT DISTINCT shop_id, 1 FROM settings_records`,
	...['INSERT', 'UPDATE', 'DELETE'].map(
		(
			op
		) => `CREATE TRIGGER settings_record_versions_${op.toLowerCase()} AFTER ${op} ON settings_records
		BEGIN
			INSERT INTO settings_record_versions (shop_id, version) VALUES (${op === 'DELETE' ? 'old' : 'new'}.shop_id, 1)
			ON CONFLICT (shop_id) DO UPDATE SET version = version + 1;
			${op === 'UPDATE' ? 'UPDATE settings_record_versions SET version = version + 1 WHERE shop_id = old.shop_id AND old.shop_id <> new.shop_id;' : ''}
		END`
	)
];

const SQLITE_DOWN = [
	...['insert', 'update', 'delete'].map((op) => `DROP TRIGGER settings_record_versions_${op}`),
	'DROP TABLE settings_record_versions',
	...['ai', 'ad', 'au'].map((t) => `DROP TRIGGER settings_records_fts_${t}`),
	'DROP TABLE settings_records_fts'
];

const POSTGRES_UP = [
	'CREATE EXTENSION IF NOT EXISTS pg_trgm',
	`CREATE INDEX settings_records_search_trgm ON settings_records
		USING gin (search_text gin_trgm_ops)`,
	`CREATE TABLE settings_record_versions (
		shop_id INTEGER PRIMARY KEY REFERENCES shops(id), version INTEGER NOT NULL)`,
	`INSERT INTO settings_record_versions (shop_id, version)
		SELECT DISTINCT shop_id, 1 FROM settings_records`,
	`CREATE FUNCTION settings_record_versions_bump() RETURNS trigger AS $$
	BEGIN
		IF TG_OP <> 'INSERT' THEN
			INSERT INTO settings_record_versions (shop_id, version) VALUES (OLD.shop_id, 1)
			ON CONFLICT (shop_id) DO UPDATE SET version = settings_record_versions.version + 1;
		END IF;
		IF TG_OP <> 'DELETE' AND (TG_OP = 'INSERT' OR NEW.shop_id <> OLD.shop_id) THEN
			INSERT INTO settings_record_versions (shop_id, version) VALUES (NEW.shop_id, 1)
			ON CONFLICT (shop_id) DO UPDATE SET version = settings_record_versions.version + 1;
		END IF;
		RETURN NULL;
	END $$ LANGUAGE plpgsql`,
	`CREATE TRIGGER settings_record_versions_bump AFTER INSERT OR UPDATE OR DELETE
		ON settings_records FOR EACH ROW EXECUTE FUNCTION settings_record_versions_bump()`
];

const POSTGRES_DOWN = [
	'DROP TRIGGER settings_record_versions_bump ON settings_records',
	'DROP FUNCTION settings_record_versions_bump()',
	'DROP TABLE settings_record_versions',
	'DROP INDEX settings_records_search_trgm'
];

const statements = (q: QueryInterface, sqlite: string[], postgres: string[]) =>
	isPostgres(q) ? postgres : sqlite;

export async function up({ context: q }: { context: QueryInterface }) {
	for (const sql of statements(q, SQLITE_UP, POSTGRES_UP)) await q.sequelize.query(sql);
}

export async function down({ context: q }: { context: QueryInterface }) {
	for (const sql of statements(q, SQLITE_DOWN, POSTGRES_DOWN)) await q.sequelize.query(sql);
}
