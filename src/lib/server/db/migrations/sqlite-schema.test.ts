import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

// Shipped migrations may gain a PostgreSQL branch, never a change on SQLite: the schema a fresh
// SQLite file gets must stay byte-for-byte what 0001–0007 made before PostgreSQL support (the
// snapshot was taken from those migrations as they shipped). Append new migrations' objects here.
const onPostgres = process.env.BEADLINE_TEST_DB === 'postgres';
if (!onPostgres)
	process.env.DATABASE_FILE = join(mkdtempSync(join(tmpdir(), 'beadline-schema-')), 't.sqlite');

describe.skipIf(onPostgres)('SQLite schema (SQLite only: the PostgreSQL run has its own)', () => {
	it('is byte-for-byte the schema the shipped migrations made', async () => {
		const { migrate, sequelize } = await import('../index');
		await migrate();
		const [rows] = (await sequelize.query(
			'SELECT sql FROM sqlite_master WHERE sql IS NOT NULL ORDER BY type, name'
		)) as [Array<{ sql: string }>, unknown];
		const snapshot = readFileSync(join(import.meta.dirname, 'sqlite-schema.snapshot.sql'), 'utf8');
		expect(rows.map((r) => `${r.sql};`).join('\n\n') + '\n').toBe(snapshot);
	});
});
