import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

process.env.DATABASE_FILE = join(
	mkdtempSync(join(tmpdir(), 'beadline-member-cache-')),
	'test.sqlite'
);

const { sequelize } = await import('../db');
const { changeRole, disableMember, enableMember, signOutEverywhere } =
	await import('../people/members');
const { addMember, newShop } = await import('../people/test-support');
const { memberFor } = await import('./member-cache');

let shop: Awaited<ReturnType<typeof newShop>>;
beforeAll(async () => {
	shop = await newShop('Member Cache');
});

/** Another server process on the same file: a write that never went through this process. */
const elsewhere = (sql: string, replacements: unknown[]) => sequelize.query(sql, { replacements });

describe('the cached member', () => {
	it('answers the member, and a role change on the very next request', async () => {
		const w = await addMember(shop.shopId, 'welder');
		expect(await memberFor(w.id, 1)).toMatchObject({ id: w.id, role: 'welder' });
		expect(await memberFor(w.id, 1)).toMatchObject({ role: 'welder' });
		await changeRole(shop.admin, w.id, 'engineer');
		expect(await memberFor(w.id, 1)).toMatchObject({ role: 'engineer' });
	});

	it('signs out at once when disabled, and stays out with the old token after enabling', async () => {
		const w = await addMember(shop.shopId, 'welder');
		expect(await memberFor(w.id, 1)).not.toBeNull();
		await disableMember(shop.admin, w.id);
		expect(await memberFor(w.id, 1)).toBeNull();
		await enableMember(shop.admin, w.id);
		// Disabling bumped the session version: the token from before is dead for good.
		expect(await memberFor(w.id, 1)).toBeNull();
		expect(await memberFor(w.id, 2)).not.toBeNull();
	});

	it('ends every session on "sign out everywhere"', async () => {
		const w = await addMember(shop.shopId, 'inspector');
		expect(await memberFor(w.id, 1)).not.toBeNull();
		await signOutEverywhere(shop.admin, w.id);
		expect(await memberFor(w.id, 1)).toBeNull();
	});

	it('sees writes made by another process, even ones that leave updated_at alone', async () => {
		const w = await addMember(shop.shopId, 'welder');
		expect(await memberFor(w.id, 1)).toMatchObject({ role: 'welder' });
		await elsewhere('UPDATE users SET role = ? WHERE id = ?', ['admin', w.id]);
		expect(await memberFor(w.id, 1)).toMatchObject({ role: 'admin' });
		await elsewhere('UPDATE users SET active = ? WHERE id = ?', [false, w.id]);
		expect(await memberFor(w.id, 1)).toBeNull();
	});

	it('refreshes names and the shop when their rows change', async () => {
		const w = await addMember(shop.shopId, 'welder');
		expect(await memberFor(w.id, 1)).toMatchObject({ shopName: 'Member Cache' });
		await elsewhere(
			"UPDATE users SET name = ?, updated_at = '2099-01-01 00:00:00.000 +00:00' WHERE id = ?",
			['Renamed', w.id]
		);
		await elsewhere(
			"UPDATE shops SET name = ?, updated_at = '2099-01-01 00:00:00.000 +00:00' WHERE id = ?",
			['Member Cache Ltd', shop.shopId]
		);
		expect(await memberFor(w.id, 1)).toMatchObject({
			name: 'Renamed',
			shopName: 'Member Cache Ltd'
		});
	});

	it('answers null for someone who is not there', async () => {
		expect(await memberFor('00000000-0000-4000-8000-000000000000', 1)).toBeNull();
	});
});
