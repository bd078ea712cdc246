import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-seed-procedures-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { migrate } = await import('../db');
const { seedDemo } = await import('./seed-demo');
const { seedProcedures } = await import('./seed-procedures');
const { seedIsoPqr, seedIsoProcedure } = await import('./seed-iso');
const { BoothLink, Pqr, Procedure, ProcedureRevision, RevisionPqr } = await import('../models');
const { checkIntegrity } = await import('../procedures');

describe('demo procedures', () => {
	it('has a revision in every state, signed ones intact, and seeding again changes nothing', async () => {
		await migrate();
		const { shop } = await seedDemo();
		const revisions = await ProcedureRevision.findAll({ where: { shopId: shop.id } });
		expect(new Set(revisions.map((r) => r.state))).toEqual(
			new Set(['draft', 'in-review', 'approved', 'superseded', 'withdrawn'])
		);
		for (const r of revisions.filter((x) =>
			['approved', 'superseded', 'withdrawn'].includes(x.state)
		))
			expect(await checkIntegrity(r.id)).toMatchObject({ signed: true, ok: true });
		// Four ASME PQRs and the ISO 15614-1 coupon (seed-iso.ts, issue 15).
		expect(await Pqr.count({ where: { shopId: shop.id, state: 'certified' } })).toBe(5);
		const iso = await Pqr.findOne({ where: { shopId: shop.id, code: 'iso-15614-1' } });
		expect(iso?.number).toBe('PQR-ISO-01');
		const d11 = await Pqr.findOne({ where: { shopId: shop.id, number: 'PQR-002' } });
		expect(d11?.code).toBe('aws-d1.1');
		expect(await seedIsoPqr(shop)).toBe(0);
		expect(await seedProcedures(shop)).toBe(0);
		// Four ASME / D1.1 procedures and WPS-ISO-01 (issue 15).
		expect(await Procedure.count({ where: { shopId: shop.id } })).toBe(5);
	});

	it('has an approved ISO 15614-1 WPS backed by PQR-ISO-01, with a booth link, seeded once', async () => {
		const { shop } = await seedDemo();
		const wps = await Procedure.findOne({ where: { shopId: shop.id, number: 'WPS-ISO-01' } });
		expect(wps).toMatchObject({ code: 'iso-15609-1', state: 'approved' });
		const rev = await ProcedureRevision.findOne({ where: { procedureId: wps!.id, rev: 1 } });
		expect(await checkIntegrity(rev!.id)).toMatchObject({ signed: true, ok: true });
		const iso = await Pqr.findOne({ where: { shopId: shop.id, number: 'PQR-ISO-01' } });
		expect(await RevisionPqr.count({ where: { revisionId: rev!.id, pqrId: iso!.id } })).toBe(1);
		expect(await BoothLink.count({ where: { revisionId: rev!.id, revokedAt: null } })).toBe(1);
		expect(await seedIsoProcedure(shop)).toBe(0);
		expect(await Procedure.count({ where: { shopId: shop.id } })).toBe(5);
	});
});
