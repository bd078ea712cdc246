// The bench's data on PostgreSQL (`--db postgres`): the SQLite seed is copied over with db:copy
// (so what runs is the product's own copy), then the growth phase adds settings records here in
// one INSERT … SELECT over generate_series per batch, cloned from the shop's own records, as
// seed-bulk.ts does on SQLite. Ids come from the table's sequence; the triggers of migration
// 0009 keep the search index and the version counters as the rows go in.
import { spawnSync } from 'node:child_process';
import pg from 'pg';
import { startPostgres, type RunningPostgres } from '../lib/postgres';

export interface BenchPostgres {
	pg: RunningPostgres;
	url: string;
	client: pg.Client;
}

/** A throw-away cluster holding a copy of the SQLite file `from`. */
export async function copyToPostgres(from: string): Promise<BenchPostgres> {
	const cluster = await startPostgres();
	const url = await cluster.createDatabase('beadline_bench');
	const env = { ...process.env };
	delete env.DATABASE_FILE;
	const copied = spawnSync(
		process.execPath,
		['--import', 'tsx', 'scripts/db-copy.ts', '--from', `sqlite:${from}`, '--to', url],
		{ env, stdio: ['ignore', 'ignore', 'inherit'] }
	);
	if (copied.status !== 0) throw new Error(`db:copy to PostgreSQL failed (exit ${copied.status})`);
	const client = new pg.Client({ connectionString: url });
	await client.connect();
	return { pg: cluster, url, client };
}

export async function countRecordsPg(client: pg.Client, shopId?: number): Promise<number> {
	const r = await client.query<{ n: string }>(
		`SELECT count(*) AS n FROM settings_records${shopId === undefined ? '' : ' WHERE shop_id = $1'}`,
		shopId === undefined ? [] : [shopId]
	);
	return Number(r.rows[0]?.n ?? 0);
}

/** Adds `count` records to the shop, cloned round-robin from the records with `templateIds`. */
export async function addRecordsPg(
	client: pg.Client,
	shopId: number,
	count: number,
	templateIds: number[]
): Promise<void> {
	const cols = (
		await client.query<{ column_name: string }>(
			"SELECT column_name FROM information_schema.columns WHERE table_name = 'settings_records' AND column_name <> 'id' ORDER BY ordinal_position"
		)
	).rows.map((c) => c.column_name);
	const job = "'JOB-' || lpad((g.i % 997)::text, 4, '0')";
	// Spread over 1000 days, so date filters and sorts see a realistic spread.
	const stamp = "now() - (g.i % 1000) * interval '1 day'";
	const over: Record<string, string> = {
		welded_on: 'current_date - (g.i % 1000)',
		job_ref: job,
		notes: "'bench record ' || g.i",
		search_text: `t.search_text || ' ' || lower(${job}) || ' bench'`,
		frozen_at: 'NULL',
		cited_by_procedure_id: 'NULL',
		created_at: stamp,
		updated_at: stamp
	};
	const batch = 25_000;
	for (let done = 0; done < count; done += batch) {
		const size = Math.min(batch, count - done);
		await client.query(
			`WITH t AS (SELECT *, row_number() OVER (ORDER BY id) - 1 AS k
			            FROM settings_records WHERE id = ANY($1::int[]))
			 INSERT INTO settings_records (${cols.map((c) => `"${c}"`).join(',')})
			 SELECT ${cols.map((c) => over[c] ?? `t."${c}"`).join(',')}
			 FROM generate_series(${done}, ${done + size - 1}) g(i)
			 JOIN t ON t.k = g.i % ${templateIds.length}
			 WHERE t.shop_id = $2`,
			[templateIds, shopId]
		);
	}
}
