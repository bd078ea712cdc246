// The database the bench's servers run on (`--db sqlite`, the default, or `--db postgres`). Both
// start from the same SQLite seed; on PostgreSQL it is copied into a throw-away cluster first.
// The growth phase adds records and counts them through this, on whichever database it is.
import type { Row, SqliteFile } from '../lib/sqlite-file';
import { addRecordsPg, copyToPostgres, countRecordsPg } from './grow-postgres';
import { addRecords, countRecords, type BenchShop } from './seed-bulk';

export type BenchDatabaseKind = 'sqlite' | 'postgres';

export interface BenchDatabase {
	kind: BenchDatabaseKind;
	/** The environment the app processes start with. */
	env: NodeJS.ProcessEnv;
	countRecords(shopId?: number): Promise<number>;
	addRecords(count: number): Promise<void>;
	/** After a bulk insert, before timing: fold SQLite's WAL back / refresh PostgreSQL's statistics. */
	settle(): Promise<void>;
	close(): Promise<void>;
}

export async function benchDatabase(
	kind: BenchDatabaseKind,
	db: SqliteFile,
	shop: Pick<BenchShop, 'shopId' | 'authorIds'>,
	templates: Row[]
): Promise<BenchDatabase> {
	if (kind === 'sqlite')
		return {
			kind,
			env: process.env,
			countRecords: (shopId) => countRecords(db, shopId),
			addRecords: (count) => addRecords(db, shop, count, templates),
			settle: () => db.exec('PRAGMA wal_checkpoint(TRUNCATE)'),
			close: async () => {}
		};
	const pg = await copyToPostgres(process.env.DATABASE_FILE!);
	const env: NodeJS.ProcessEnv = { ...process.env, DATABASE_URL: pg.url };
	delete env.DATABASE_FILE;
	const templateIds = templates.map((t) => Number(t.id));
	return {
		kind,
		env,
		countRecords: (shopId) => countRecordsPg(pg.client, shopId),
		addRecords: (count) => addRecordsPg(pg.client, shop.shopId, count, templateIds),
		settle: async () => {
			await pg.client.query('VACUUM ANALYZE settings_records');
		},
		close: async () => {
			await pg.client.end();
			await pg.pg.stop();
		}
	};
}
