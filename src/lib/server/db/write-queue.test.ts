import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

// A throw-away database for this file, set before the data layer is first imported.
process.env.DATABASE_FILE = join(mkdtempSync(join(tmpdir(), 'beadline-db-')), 'test.sqlite');

const { migrate, sequelize, write } = await import('./index');
const { AuditEvent, Shop } = await import('../models');
const onPostgres = process.env.BEADLINE_TEST_DB === 'postgres';

beforeAll(async () => {
	await migrate();
});

describe('write queue', () => {
	it('runs 200 concurrent write transactions with no SQLITE_BUSY', async () => {
		const results = await Promise.allSettled(
			Array.from({ length: 200 }, (_, i) =>
				write(async (t) => {
					const shop = await Shop.create({ name: `Queue shop ${i}` }, { transaction: t });
					await Shop.update(
						{ name: `Queue shop ${i} (renamed)` },
						{ where: { id: shop.id }, transaction: t }
					);
					return shop.id;
				})
			)
		);
		const failed = results.filter((r) => r.status === 'rejected');
		expect(failed).toEqual([]);
		expect(
			await Shop.count({
				where: { name: { [(await import('sequelize')).Op.like]: 'Queue shop %' } }
			})
		).toBe(200);
	});

	it('rolls back a failed transaction and keeps serving the next ones', async () => {
		await expect(
			write(async (t) => {
				await Shop.create({ name: 'Rolled back' }, { transaction: t });
				throw new Error('boom');
			})
		).rejects.toThrow('boom');
		expect(await Shop.count({ where: { name: 'Rolled back' } })).toBe(0);
		await expect(
			write(async (t) => (await Shop.create({ name: 'After' }, { transaction: t })).id)
		).resolves.toBeTypeOf('number');
	});

	// WAL is SQLite's journal; PostgreSQL has its own write-ahead log and no such switch.
	it.skipIf(onPostgres)('turns on WAL (SQLite only)', async () => {
		const [[mode]] = (await sequelize.query('PRAGMA journal_mode')) as [
			Array<{ journal_mode: string }>,
			unknown
		];
		expect(mode?.journal_mode).toBe('wal');
	});

	it('enforces foreign keys', async () => {
		await expect(
			sequelize.query(
				"INSERT INTO users (id, shop_id, name, email, role, active, session_version, created_at, updated_at) VALUES ('00000000-0000-4000-8000-000000000000', 999999, 'x', 'x@x.invalid', 'admin', true, 1, '2026-01-01', '2026-01-01')"
			)
		).rejects.toThrow(/foreign key/i);
	});
});

describe('audit trail', () => {
	it('refuses UPDATE and DELETE', async () => {
		const event = await AuditEvent.create({
			shopId: null,
			actorId: null,
			actorName: 'test',
			action: 'test.created',
			objectType: 'test',
			objectId: '1',
			before: null,
			after: '{}',
			ip: null,
			userAgent: null
		});
		// Sequelize wraps the SQLite error; the trigger's own words are on `parent`.
		const refusal = (sql: string) =>
			sequelize.query(sql).then(
				() => 'accepted',
				(e: { parent?: Error; message: string }) => e.parent?.message ?? e.message
			);
		expect(
			await refusal(`UPDATE audit_events SET action = 'forged' WHERE id = ${event.id}`)
		).toMatch(/append-only/);
		expect(await refusal(`DELETE FROM audit_events WHERE id = ${event.id}`)).toMatch(/append-only/);
		expect((await AuditEvent.findByPk(event.id))?.action).toBe('test.created');
	});
});
