// db:copy — moves a shop's whole database between SQLite and PostgreSQL (either way): migrates the
// target, refuses one that already holds data, copies every table in foreign-key order with its
// ids, moves PostgreSQL's id sequences past them, copies the uploads, and then verifies: the same
// row count in every table, and every signature (sign-off seals, approved digests, certified
// PQRs) recomputed from the copied rows. Import only after DATABASE_URL names the target: the
// verification runs the product's own integrity check through the process's models.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { parseDatabaseUrl, type DatabaseTarget } from '../../src/lib/server/db/database-url';
import { checkDatabase, DatabaseConfigError } from '../../src/lib/server/db/connect';
import { isPostgres, resetSequences, tableNames } from '../../src/lib/server/db/dialect';
import { migrateDatabase, pendingMigrations } from '../../src/lib/server/db/migrate';
import { openSequelize, sequelize as target } from '../../src/lib/server/db/sequelize';
import { copyUploads, type UploadsCopy } from './db-copy-uploads';

const MIGRATIONS_TABLE = 'schema_migrations';
/**
 * Kept by the target's own triggers as the records are inserted (migration 0009: SQLite's FTS5
 * index and its shadow tables, the per-shop version counters), so never copied or counted.
 */
const DERIVED = /^(settings_records_fts($|_)|settings_record_versions$)/;
const BATCH = 500;

export interface CopyReport {
	tables: Array<{ table: string; rows: number }>;
	uploads: UploadsCopy;
	signaturesChecked: number;
	pqrsChecked: number;
}

/** A refusal or a failed verification: the message says it all (the CLI prints it alone). */
export class CopyRefused extends DatabaseConfigError {
	override name = 'CopyRefused';
}

const q = (name: string) => `"${name.replace(/"/g, '""')}"`;

async function count(s: Sequelize, table: string): Promise<number> {
	const [row] = await s.query<{ n: string | number }>(`SELECT COUNT(*) AS n FROM ${q(table)}`, {
		type: QueryTypes.SELECT
	});
	return Number(row?.n ?? 0);
}

/** Tables ordered so every table comes after the tables its foreign keys point at. */
async function foreignKeyOrder(s: Sequelize, tables: string[]): Promise<string[]> {
	const qi = s.getQueryInterface();
	const deps = new Map<string, Set<string>>();
	for (const t of tables) {
		const refs = (await qi.getForeignKeyReferencesForTable(t)) as Array<{
			referencedTableName?: string;
		}>;
		deps.set(
			t,
			new Set(
				refs.map((r) => r.referencedTableName!).filter((r) => r && r !== t && tables.includes(r))
			)
		);
	}
	const out: string[] = [];
	const placed = new Set<string>();
	while (out.length < tables.length) {
		const ready = tables.filter(
			(t) => !placed.has(t) && [...deps.get(t)!].every((d) => placed.has(d))
		);
		if (!ready.length)
			throw new Error(
				`Foreign keys form a cycle among ${tables.filter((t) => !placed.has(t)).join(', ')}`
			);
		for (const t of ready) {
			out.push(t);
			placed.add(t);
		}
	}
	return out;
}

type Row = Record<string, unknown>;

/** Values as the target's driver takes them: SQLite keeps booleans as 0/1, PostgreSQL wants true/false. */
function converter(columns: Record<string, { type: string }>, toPostgres: boolean) {
	const booleans = Object.entries(columns)
		.filter(([, c]) => /^BOOL/i.test(c.type) || /^TINYINT\(1\)$/i.test(c.type))
		.map(([name]) => name);
	return (row: Row): Row => {
		if (!booleans.length) return row;
		const out = { ...row };
		for (const b of booleans)
			if (out[b] !== null && out[b] !== undefined)
				out[b] = toPostgres ? out[b] === true || Number(out[b]) === 1 : out[b] ? 1 : 0;
		return out;
	};
}

async function copyTable(
	from: Sequelize,
	to: Sequelize,
	table: string,
	t: Transaction
): Promise<number> {
	const columns = (await to
		.getQueryInterface()
		.describeTable(table, { transaction: t } as never)) as Record<
		string,
		{ type: string; primaryKey: boolean }
	>;
	const convert = converter(columns, isPostgres(to));
	const keyed = 'id' in columns && /INT/i.test(columns.id!.type);
	const pk = Object.entries(columns)
		.filter(([, c]) => c.primaryKey)
		.map(([n]) => q(n));
	const order = pk.length ? pk.join(', ') : Object.keys(columns).map(q).join(', ');
	let copied = 0;
	let after = -Infinity;
	for (let offset = 0; ; offset += BATCH) {
		// Pages by id where there is one (stays fast on 100k rows); small tables page by offset.
		const rows = await from.query<Row>(
			keyed
				? `SELECT * FROM ${q(table)} WHERE id > ${after === -Infinity ? -1 : after} ORDER BY id LIMIT ${BATCH}`
				: `SELECT * FROM ${q(table)} ORDER BY ${order} LIMIT ${BATCH} OFFSET ${offset}`,
			{ type: QueryTypes.SELECT }
		);
		if (!rows.length) break;
		await to.getQueryInterface().bulkInsert(table, rows.map(convert), { transaction: t });
		copied += rows.length;
		if (keyed) after = Number(rows.at(-1)!.id);
		if (rows.length < BATCH) break;
	}
	return copied;
}

/** Recomputes every signature on the target (the process's own database) with the product's check. */
async function verifySignatures(): Promise<{
	signatures: number;
	pqrs: number;
	problems: string[];
}> {
	const { checkIntegrity, pqrDigest } = await import('../../src/lib/server/procedures/digest');
	const { Pqr, SignOff } = await import('../../src/lib/server/models');
	const problems: string[] = [];
	const signed = await SignOff.findAll({
		attributes: ['revisionId'],
		group: ['revisionId'],
		raw: true
	});
	let signatures = 0;
	for (const { revisionId } of signed) {
		const r = await checkIntegrity(revisionId);
		signatures++;
		for (const p of r.problems) problems.push(`revision #${revisionId}: ${p}`);
	}
	const pqrs = await Pqr.findAll({ where: { state: 'certified' } });
	for (const p of pqrs)
		if (p.certifiedDigest && (await pqrDigest(p)) !== p.certifiedDigest)
			problems.push(`${p.number} (PQR #${p.id}) no longer matches what was certified.`);
	return { signatures, pqrs: pqrs.length, problems };
}

export interface CopyOptions {
	from: string;
	to: string;
	/** Upload back ends: a folder path or `s3`; left out, the uploads are not copied. */
	uploadsFrom?: string;
	uploadsTo?: string;
	log?: (line: string) => void;
}

function parse(value: string, name: string): Exclude<DatabaseTarget, { kind: 'invalid' }> {
	const db = parseDatabaseUrl(value, undefined, name);
	if (db.kind === 'invalid') throw new CopyRefused(db.problem);
	return db;
}

export async function copyDatabase(opts: CopyOptions): Promise<CopyReport> {
	const log = opts.log ?? (() => {});
	const fromDb = parse(opts.from, '--from');
	const toDb = parse(opts.to, '--to');
	const process_ = parse(process.env.DATABASE_URL ?? '', 'DATABASE_URL');
	if (JSON.stringify(process_) !== JSON.stringify(toDb))
		throw new Error('copyDatabase: set DATABASE_URL to the target before importing db-copy.');
	if (JSON.stringify(fromDb) === JSON.stringify(toDb))
		throw new CopyRefused('--from and --to name the same database: nothing to copy.');

	const source = openSequelize(fromDb);
	try {
		await checkDatabase(source, fromDb, '--from');
		await checkDatabase(target, toDb, '--to');
		const behind = await pendingMigrations(source);
		if (behind.length)
			throw new CopyRefused(
				`The --from database lacks migrations ${behind.join(', ')}: run npm run db:migrate on it first (DATABASE_URL=${opts.from}).`
			);
		const applied = await migrateDatabase(target);
		log(applied.length ? `target migrated: ${applied.join(', ')}` : 'target schema up to date');

		const tables = (await tableNames(source)).filter(
			(t) => t !== MIGRATIONS_TABLE && !DERIVED.test(t)
		);
		const targetTables = new Set(await tableNames(target));
		const missing = tables.filter((t) => !targetTables.has(t));
		if (missing.length)
			throw new CopyRefused(
				`The --to database has no table ${missing.join(', ')} after migrating.`
			);
		const held: string[] = [];
		for (const t of tables) {
			const n = await count(target, t);
			if (n) held.push(`${n} in ${t}`);
		}
		if (held.length)
			throw new CopyRefused(
				`The --to database is not empty (rows: ${held.slice(0, 4).join(', ')}${held.length > 4 ? ', …' : ''}): db:copy only copies into an empty database, so nothing was copied.`
			);

		const report: CopyReport = {
			tables: [],
			uploads: { files: 0, bytes: 0, skipped: 'not asked', problems: [] },
			signaturesChecked: 0,
			pqrsChecked: 0
		};
		// One transaction: a copy that fails half-way leaves the target as empty as it was.
		const order = await foreignKeyOrder(target, tables);
		await target.transaction(async (t) => {
			for (const table of order) {
				const rows = await copyTable(source, target, table, t);
				report.tables.push({ table, rows });
				log(`${table}: ${rows} rows`);
			}
			await resetSequences(target, tables, t);
		});
		report.uploads = await copyUploads(opts.uploadsFrom, opts.uploadsTo);
		if (report.uploads.problems.length)
			throw new CopyRefused(
				`Verification failed, uploads did not arrive intact: ${report.uploads.problems.slice(0, 5).join('; ')}.`
			);

		const mismatched: string[] = [];
		for (const t of tables) {
			const [a, b] = [await count(source, t), await count(target, t)];
			if (a !== b) mismatched.push(`${t} (${a} → ${b})`);
		}
		if (mismatched.length)
			throw new CopyRefused(`Verification failed, row counts differ: ${mismatched.join(', ')}.`);
		const v = await verifySignatures();
		if (v.problems.length)
			throw new CopyRefused(
				`Verification failed, signatures do not verify: ${v.problems.join(' ')}`
			);
		report.signaturesChecked = v.signatures;
		report.pqrsChecked = v.pqrs;
		return report;
	} finally {
		await source.close();
	}
}
