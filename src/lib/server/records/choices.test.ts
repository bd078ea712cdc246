// The filter choices' cache: current after every write, including writes no cache in this
// process saw (another server process on the same database, here a plain SQL statement).
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-choices-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { sequelize } = await import('../db');
const { settingsRecordSchema } = await import('$lib/schemas/settings-record');
const { newShop, addMember } = await import('../people/test-support');
const svc = await import('./index');

let engineer: Awaited<ReturnType<typeof addMember>>;
const record = (fillerClass: string) =>
	svc.createRecord(
		engineer,
		settingsRecordSchema.parse({ process: 'GTAW', weldedOn: '2025-06-01', fillerClass })
	);

beforeAll(async () => {
	const shop = await newShop('Choices Shop');
	engineer = await addMember(shop.shopId, 'engineer', 'Cora Choices');
});

describe('filter choices', () => {
	it('adds a filler at the next list after a record is saved', async () => {
		await record('ER70S-6');
		expect(await svc.fillersInUse(engineer.shopId)).toEqual(['ER70S-6']);
		await record('ER4043');
		expect(await svc.fillersInUse(engineer.shopId)).toEqual(['ER4043', 'ER70S-6']);
	});

	it('sees a write made by another process', async () => {
		expect(await svc.fillersInUse(engineer.shopId)).not.toContain('ER308L');
		await sequelize.query(
			'UPDATE settings_records SET filler_class = ? WHERE shop_id = ? AND filler_class = ?',
			{
				replacements: ['ER308L', engineer.shopId, 'ER4043']
			}
		);
		expect(await svc.fillersInUse(engineer.shopId)).toEqual(['ER308L', 'ER70S-6']);
	});

	it('follows the shop’s people for the author filter', async () => {
		expect([...(await svc.authorNames(engineer.shopId)).values()]).toContain('Cora Choices');
		await addMember(engineer.shopId, 'welder', 'Dev Newcomer');
		expect([...(await svc.authorNames(engineer.shopId)).values()]).toContain('Dev Newcomer');
	});
});
