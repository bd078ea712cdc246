import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Op } from 'sequelize';
import { describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-seed-welders-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { migrate } = await import('../db');
const { seedDemo } = await import('./seed-demo');
const { AuditEvent, Qualification, QualificationConfirmation, Welder } = await import('../models');
const { loadWelders } = await import('../welders/read');
const { localDay } = await import('../welders/dates');

describe('demo welders', () => {
	it('have a qualification in every state, and seeding again adds nothing', async () => {
		await migrate();
		const { shop } = await seedDemo();
		const counts = async () => ({
			welders: await Welder.count(),
			qualifications: await Qualification.count(),
			confirmations: await QualificationConfirmation.count(),
			audits: await AuditEvent.count()
		});
		const first = await counts();
		await seedDemo();
		expect(await counts()).toEqual(first);

		const quals = (await loadWelders(shop.id, localDay())).flatMap((w) =>
			w.qualifications.map((q) => ({ welder: w.name, ...q }))
		);
		expect(new Set(quals.map((q) => q.status.state))).toEqual(
			new Set(['current', 'lapsed', 'withdrawn'])
		);
		// Priya Venn's GMAW lapses in 5 days (the reminder job's case).
		expect(quals.filter((q) => q.status.dueSoon).map((q) => q.welder)).toEqual(['Priya Venn']);

		const withdrawn = quals.filter((q) => q.status.state === 'withdrawn');
		expect(withdrawn.map((q) => [q.welder, q.process])).toEqual([['Jun Halloran', 'SMAW']]);
		const iso = quals.filter((q) => q.code === 'ISO 9606-1');
		expect(iso.map((q) => [q.welder, q.process, q.status.state, q.status.basis])).toEqual([
			['Arlo Brandt', 'GMAW', 'current', 'confirmation']
		]);
		expect(iso[0]!.confirmations).toHaveLength(1);
		// Made through the services, so the trail says what the app would have written.
		for (const action of ['qualification.withdrawn', 'qualification.confirmed'])
			expect(await AuditEvent.count({ where: { action } })).toBe(1);
	});

	it('get the withdrawn and ISO 9606-1 qualifications in a demo database seeded before them', async () => {
		const ids = (
			await Qualification.findAll({
				where: { [Op.or]: [{ withdrawnAt: { [Op.ne]: null } }, { code: 'ISO 9606-1' }] }
			})
		).map((q) => q.id);
		expect(ids).toHaveLength(2);
		await QualificationConfirmation.destroy({ where: { qualificationId: ids } });
		await Qualification.destroy({ where: { id: ids } });
		await seedDemo();
		expect(await Qualification.count({ where: { withdrawnAt: { [Op.ne]: null } } })).toBe(1);
		expect(await Qualification.count({ where: { code: 'ISO 9606-1' } })).toBe(1);
		expect(await QualificationConfirmation.count()).toBe(1);
	});
});
