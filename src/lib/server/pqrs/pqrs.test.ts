import { createHash } from 'node:crypto';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-pqrs-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { sequelize } = await import('../db');
const { AuditEvent, PqrReport } = await import('../models');
const { NotFoundError, RefusedError } = await import('../people/errors');
const svc = await import('./index');
const T = await import('../procedures/test-support');

type People = Awaited<ReturnType<typeof T.shopWithPeople>>;
let a: People, b: People;
const PDF = new TextEncoder().encode('%PDF-1.4\n1 0 obj <<>> endobj\ntrailer <<>>\n%%EOF\n');

beforeAll(async () => {
	a = await T.shopWithPeople('PQR Shop');
	b = await T.shopWithPeople('Other PQR Shop');
});

describe('PQRs', () => {
	it('computes the ranges a coupon qualifies and keeps the test results with their units', async () => {
		const { id } = await svc.createPqr(a.engineer, T.pqrForm());
		const v = await svc.getPqr(a.engineer, id);
		// QW-451.1: T = 1/4 in (1/16 to 3/8 in row) qualifies 1/16 in to 2T = 1/2 in.
		expect(v.qualified.thickness).toMatchObject({
			min: { value: 0.0625, unit: 'in' },
			max: { value: 0.5, unit: 'in' }
		});
		// QW-461.9: a 3G test covers groove F, V and fillet F, H, V.
		expect(v.qualified.positions).toMatchObject({ groove: ['F', 'V'], fillet: ['F', 'H', 'V'] });
		expect(v.qualified).toMatchObject({
			pNumbers: ['1'],
			fNumbers: [6],
			currentType: 'DCEN',
			amps: 125
		});
		expect(v.tests.find((t) => t.kind === 'tensile')).toMatchObject({
			result: 'pass',
			values: [
				{ label: 'Specimen 1', value: 72500, unit: 'psi' },
				{ label: 'Specimen 2', value: 71800, unit: 'psi' }
			]
		});
	});

	it('follows the code it is given, else the shop default, and an edit without one keeps it (issue 15)', async () => {
		const { Shop } = await import('../models');
		const { id: asGiven } = await svc.createPqr(a.engineer, {
			...T.pqrForm(),
			code: 'asme-ix+iso'
		});
		const both = await svc.getPqr(a.engineer, asGiven);
		expect(both.code).toBe('asme-ix+iso');
		// One coupon to both codes: the ISO 15614-1 set is there beside the ASME IX one.
		expect(both.iso?.items.length).toBeGreaterThan(0);
		expect(both.qualified.thickness).not.toBeNull();
		await Shop.update({ defaultCode: 'iso-15614-1' }, { where: { id: b.engineer.shopId } });
		const { id } = await svc.createPqr(b.engineer, { ...T.pqrForm(), number: 'PQR-CODE-1' });
		expect((await svc.getPqr(b.engineer, id)).code).toBe('iso-15614-1');
		await svc.updatePqr(b.engineer, id, { ...T.pqrForm(), number: 'PQR-CODE-1', title: 'Renamed' });
		expect((await svc.getPqr(b.engineer, id)).code).toBe('iso-15614-1');
		await svc.updatePqr(b.engineer, id, { ...T.pqrForm(), number: 'PQR-CODE-1', code: 'aws-d1.1' });
		expect((await svc.getPqr(b.engineer, id)).code).toBe('aws-d1.1');
		await Shop.update({ defaultCode: 'asme-ix' }, { where: { id: b.engineer.shopId } });
	});

	it('takes lab reports as PDF only, checked by content, and records their SHA-256', async () => {
		const { id } = await svc.createPqr(a.engineer, T.pqrForm());
		const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0]);
		await expect(
			svc.uploadReport(a.engineer, id, { bytes: png, name: 'report.pdf' })
		).rejects.toThrow(/not a PDF/);
		await expect(
			svc.uploadReport(a.engineer, id, {
				bytes: new Uint8Array(svc.MAX_REPORT_BYTES + 1),
				name: 'big.pdf'
			})
		).rejects.toThrow(/limit is 20 MB/);
		const { id: reportId } = await svc.uploadReport(a.engineer, id, {
			bytes: PDF,
			name: 'lab.pdf'
		});
		const row = await PqrReport.findByPk(reportId);
		expect(row?.sha256).toBe(createHash('sha256').update(PDF).digest('hex'));
		const got = await svc.openReport(a.inspector, id, reportId);
		expect(Buffer.compare(got.bytes, Buffer.from(PDF))).toBe(0);
		expect(
			await AuditEvent.count({ where: { objectId: String(id), action: 'pqr_report.downloaded' } })
		).toBe(1);
		await expect(svc.openReport(b.engineer, id, reportId)).rejects.toThrow(NotFoundError);
	});

	it('freezes on certification; corrections become addenda with their own audit events', async () => {
		const { id } = await svc.createPqr(a.engineer, T.pqrForm());
		await expect(svc.certifyPqr(a.inspector, id)).rejects.toThrow(/role/);
		const { digest } = await svc.certifyPqr(a.engineer, id);
		expect(digest).toMatch(/^[0-9a-f]{64}$/);
		await expect(svc.updatePqr(a.engineer, id, T.pqrForm())).rejects.toThrow(svc.CERTIFIED_MESSAGE);
		await expect(
			svc.uploadReport(a.engineer, id, { bytes: PDF, name: 'late.pdf' })
		).rejects.toThrow(RefusedError);
		await svc.addAddendum(a.engineer, id, 'Tensile specimen 2 was 71 800 psi, not 71 080.');
		const v = await svc.getPqr(a.engineer, id);
		expect(v).toMatchObject({
			state: 'certified',
			intact: true,
			can: { edit: false, addendum: true }
		});
		expect(v.addenda[0]?.body).toMatch(/71 800/);
		expect(
			await AuditEvent.count({ where: { objectId: String(id), action: 'pqr.addendum_added' } })
		).toBe(1);
		await expect(sequelize.query('DELETE FROM pqr_addenda')).rejects.toThrow();
		await sequelize.query("UPDATE pqrs SET title = 'changed' WHERE id = ?", { replacements: [id] });
		expect((await svc.getPqr(a.engineer, id)).intact).toBe(false);
	});

	it("keeps numbers unique per shop and another shop's PQR out of reach", async () => {
		const form = T.pqrForm({ number: 'PQR-UNIQUE' });
		const { id } = await svc.createPqr(a.engineer, form);
		await expect(svc.createPqr(a.engineer, T.pqrForm({ number: 'pqr-unique' }))).rejects.toThrow(
			/already/
		);
		await svc.createPqr(b.engineer, form);
		await expect(svc.getPqr(b.engineer, id)).rejects.toThrow(NotFoundError);
		expect((await svc.listPqrs(b.engineer)).some((p) => p.id === id)).toBe(false);
	});
});
