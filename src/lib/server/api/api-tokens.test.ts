import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

process.env.DATABASE_FILE = join(mkdtempSync(join(tmpdir(), 'beadline-tokens-')), 'test.sqlite');

const { migrate } = await import('../db');
const { seedDemo } = await import('../seed/seed-demo');
const { User, ApiToken } = await import('../models');
const { createApiToken, memberForToken, revokeApiToken, hashToken } = await import('./api-tokens');

async function adminOf(email: string) {
	const u = await User.findOne({ where: { email }, include: ['Shop'] });
	if (!u) throw new Error('seed missing');
	return {
		id: u.id,
		shopId: u.shopId,
		shopName: 'x',
		name: u.name,
		email: u.email,
		role: u.role,
		unitSystem: 'imperial' as const,
		timeZone: 'UTC'
	};
}

beforeAll(async () => {
	await migrate();
	await seedDemo();
});

describe('API tokens', () => {
	it('is shown once and stored only as a SHA-256 digest', async () => {
		const admin = await adminOf('dana@larkspur.example');
		const { id, secret } = await createApiToken(
			admin,
			{ name: 'Line 2 tablet', role: 'engineer' },
			null
		);
		const row = await ApiToken.findByPk(id);
		expect(secret).toMatch(/^bl_[A-Za-z0-9_-]{43}$/);
		expect(row?.tokenHash).toBe(hashToken(secret));
		expect(JSON.stringify(row?.toJSON())).not.toContain(secret.slice(3));
	});

	it('acts with its own role in its own shop, records last use, and dies when revoked', async () => {
		const admin = await adminOf('dana@larkspur.example');
		const { id, secret } = await createApiToken(
			admin,
			{ name: 'Checks client', role: 'inspector' },
			null
		);
		const member = await memberForToken(secret);
		expect(member).toMatchObject({ shopId: admin.shopId, role: 'inspector' });
		expect((await ApiToken.findByPk(id))?.lastUsedAt).toBeInstanceOf(Date);
		expect(await revokeApiToken(admin, id, null)).toBe(true);
		expect(await memberForToken(secret)).toBeNull();
	});

	it("cannot be revoked by another shop's admin", async () => {
		const admin = await adminOf('dana@larkspur.example');
		const other = await adminOf('ines@harrowgate.example');
		const { id, secret } = await createApiToken(admin, { name: 'Kept', role: 'engineer' }, null);
		expect(await revokeApiToken(other, id, null)).toBe(false);
		expect(await memberForToken(secret)).not.toBeNull();
	});

	it('refuses malformed and unknown secrets', async () => {
		for (const s of ['', 'bl_', 'Bearer', 'x'.repeat(5000), 'bl_' + 'A'.repeat(43)]) {
			expect(await memberForToken(s)).toBeNull();
		}
	});
});
