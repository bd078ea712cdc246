import { mkdtempSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-records-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { settingsRecordSchema, readFilters } = await import('$lib/schemas/settings-record');
const { AuditEvent, SettingsPhoto, SettingsRecord } = await import('../models');
const { newShop, addMember } = await import('../people/test-support');
const { write } = await import('../db');
const svc = await import('./index');

type Actor = Awaited<ReturnType<typeof addMember>>;
let engineer: Actor, welder: Actor, inspector: Actor, outsider: Actor;

const form = (over: Record<string, string> = {}) =>
	settingsRecordSchema.parse({
		process: 'GTAW',
		currentType: 'DCEN',
		amps: '125',
		thickness: '1/8',
		baseMetalSpec: 'A36',
		fillerClass: 'er70s-6',
		fillerDiameter: '3/32',
		outcome: 'sound',
		weldedOn: '2025-03-04',
		...over
	});

beforeAll(async () => {
	const a = await newShop('Records Test Shop');
	engineer = await addMember(a.shopId, 'engineer', 'Eng One');
	welder = await addMember(a.shopId, 'welder');
	inspector = await addMember(a.shopId, 'inspector');
	const b = await newShop('Other Records Shop');
	outsider = await addMember(b.shopId, 'engineer');
});

describe('settings records', () => {
	it('stores SI values, the typed text and the findings, and audits the creation', async () => {
		const { id } = await svc.createRecord(engineer, form());
		const r = await SettingsRecord.findByPk(id, { rejectOnEmpty: true });
		expect(r.thicknessMm).toBeCloseTo(3.175, 6); // 1/8 in x 25.4 mm/in, exact by definition
		expect(r.fillerDiameterMm).toBeCloseTo(2.38125, 6);
		expect(r).toMatchObject({
			fillerClass: 'ER70S-6',
			baseMetalFamily: 'carbon-steel',
			pNumber: '1'
		});
		expect(JSON.parse(r.entered)).toEqual({
			units: 'imperial',
			fields: { amps: '125', thickness: '1/8', fillerDiameter: '3/32' }
		});
		const findings = JSON.parse(r.findings) as { check: string; status: string }[];
		expect(findings.find((f) => f.check === 'amps-vs-thickness')?.status).toBe('ok');
		const ev = await AuditEvent.findOne({
			where: { objectType: 'settings_record', objectId: String(id) }
		});
		expect(ev?.action).toBe('settings_record.created');
	});

	it('stores a caution on the amps for 250 A on 1/8 in, and still saves', async () => {
		const { id } = await svc.createRecord(engineer, form({ amps: '250' }));
		const view = await svc.getRecord(engineer, id);
		const amps = view.findings.filter((f) => f.field === 'amps' && f.status !== 'ok');
		expect(amps.length).toBeGreaterThan(0);
		expect(view.cautionCount).toBeGreaterThan(0);
	});

	it('reads metric text with the metric default, and leaves out fields the process does not use', async () => {
		const { id } = await svc.createRecord(
			engineer,
			form({
				units: 'metric',
				thickness: '3',
				tungstenClass: 'EWLa-1.5',
				process: 'GMAW',
				transfer: 'spray'
			})
		);
		const r = await SettingsRecord.findByPk(id, { rejectOnEmpty: true });
		expect(r.thicknessMm).toBe(3);
		expect(r.tungstenClass).toBeNull();
		expect(r.transfer).toBe('spray');
	});

	it('gives field errors for text it cannot read', () => {
		const bad = settingsRecordSchema.safeParse({
			process: 'GTAW',
			thickness: 'thick',
			weldedOn: '2025-01-01'
		});
		expect(bad.success).toBe(false);
		expect(bad.error?.issues.map((i) => i.path.join('.'))).toContain('thickness');
	});

	it('keeps other shops out, welders and inspectors from writing, and frozen records still', async () => {
		const { id } = await svc.createRecord(engineer, form());
		await expect(svc.getRecord(outsider, id)).rejects.toThrow(/No such settings record/);
		await expect(svc.updateRecord(outsider, id, form())).rejects.toThrow(/No such settings record/);
		await expect(svc.createRecord(welder, form())).rejects.toThrow(/role/);
		await expect(svc.updateRecord(inspector, id, form())).rejects.toThrow(/role/);
		await svc.updateRecord(engineer, id, form({ amps: '130' }));
		const history = await svc.recordHistory(engineer, id);
		expect(history[0]).toMatchObject({ action: 'Settings record edited', changed: ['amperage'] });
		await write((t) => svc.freezeRecord(engineer.shopId, id, 99, t));
		await expect(svc.updateRecord(engineer, id, form())).rejects.toThrow(/frozen/);
		expect((await svc.getRecord(engineer, id)).canEdit).toBe(false);
	});

	it('stores photos and refuses a renamed executable without saving anything', async () => {
		const jpeg = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#888' } })
			.jpeg()
			.toBuffer();
		const { id } = await svc.createRecord(engineer, form(), [{ name: 'bead.jpg', bytes: jpeg }]);
		expect(await SettingsPhoto.count({ where: { recordId: id } })).toBe(1);
		const before = await SettingsRecord.count();
		const exe = { name: 'setup.jpg', bytes: new TextEncoder().encode('MZ\x90\x00rest') };
		await expect(svc.createRecord(engineer, form(), [exe])).rejects.toThrow(/not a JPEG or PNG/);
		expect(await SettingsRecord.count()).toBe(before);
	});

	it('refuses a 7th photo at the photos field and stores nothing', async () => {
		const img = (background: string) =>
			sharp({ create: { width: 8, height: 8, channels: 3, background } });
		const photos = await Promise.all(
			['#111', '#222', '#333', '#444', '#555', '#666', '#777'].map(async (c, i) => ({
				name: `bead-${i + 1}.${i % 2 ? 'png' : 'jpg'}`,
				bytes: i % 2 ? await img(c).png().toBuffer() : await img(c).jpeg().toBuffer()
			}))
		);
		expect(svc.MAX_PHOTOS).toBe(6); // issue 4: up to 6 images per record
		const files = () => readdirSync(process.env.UPLOADS_DIR!, { recursive: true }).length;
		const [records, stored] = [await SettingsRecord.count(), files()];
		const refused = await svc.createRecord(engineer, form(), photos).catch((e: unknown) => e);
		expect(refused).toMatchObject({ name: 'RefusedError', field: 'photos' });
		expect((refused as Error).message).toBe('A record holds up to 6 photos.');
		expect([await SettingsRecord.count(), files()]).toEqual([records, stored]);
		// An edit counts the photos already kept: 5 on the record, 2 more is one too many.
		const { id } = await svc.createRecord(engineer, form(), photos.slice(0, 5));
		const withFive = files();
		await expect(svc.updateRecord(engineer, id, form(), photos.slice(5))).rejects.toMatchObject({
			field: 'photos',
			message: 'A record holds up to 6 photos (it has 5).'
		});
		expect(await SettingsPhoto.count({ where: { recordId: id } })).toBe(5);
		expect(files()).toBe(withFive);
		await svc.updateRecord(engineer, id, form(), photos.slice(5, 6)); // the 6th still fits
		expect(await SettingsPhoto.count({ where: { recordId: id } })).toBe(6);
	});

	it('walking the date index in order gives the same page as sorting the matches', async () => {
		for (const q of ['process=GMAW&tmin=1/8&tmax=1/4', 'process=GTAW&dir=asc', 'sort=created']) {
			const f = readFilters(new URLSearchParams(q));
			const walked = await svc.listRecords(engineer, f, { strategy: 'walk' });
			const sorted = await svc.listRecords(engineer, f, { strategy: 'sort' });
			expect(walked.rows.map((r) => r.id)).toEqual(sorted.rows.map((r) => r.id));
		}
	});

	it('walks only when sorted by date and the matches are many (common practice, no source)', () => {
		expect(svc.walkInOrder('weldedOn', 30_000, 100_000, 25)).toBe(true);
		expect(svc.walkInOrder('created', 30_000, 100_000, 25)).toBe(true);
		expect(svc.walkInOrder('amps', 30_000, 100_000, 25)).toBe(false); // amps follow the filters
		expect(svc.walkInOrder('weldedOn', 500, 100_000, 25)).toBe(false); // few: sort them
		expect(svc.walkInOrder('weldedOn', 2_000, 100_000, 25)).toBe(true); // 1,250 reads < 2,000
		expect(svc.walkInOrder('weldedOn', 1_500, 100_000, 25)).toBe(false); // 1,667 > 1,500
		expect(svc.walkInOrder('weldedOn', 30_000, 100_000, 10_000)).toBe(false); // deep page
		expect(svc.walkInOrder('weldedOn', 100_000, 100_000, 25)).toBe(false); // no filter
	});

	it('filters, sorts, pages, exports and compares within the shop only', async () => {
		await svc.createRecord(
			engineer,
			form({ process: 'GMAW', thickness: '3/16', amps: '180', fillerDiameter: '0.035' })
		);
		await svc.createRecord(outsider, form({ process: 'GMAW', thickness: '3/16' }));
		const f = readFilters(new URLSearchParams('process=GMAW&tmin=1/8&tmax=1/4&sort=amps&dir=asc'));
		const list = await svc.listRecords(engineer, f);
		expect(list.rows.length).toBe(1);
		expect(list.rows[0]).toMatchObject({ process: 'GMAW', amps: 180 });
		const csv = await new Response(svc.recordsCsv(engineer, f)).text();
		const lines = csv.trim().split('\r\n');
		expect(lines.length).toBe(2);
		expect(lines[0]).toContain('thickness (in)');
		expect(lines[1]).toContain(',0.1875,');
		const all = await svc.listRecords(engineer, readFilters(new URLSearchParams()));
		const ids = all.rows.slice(0, 2).map((r) => r.id);
		const cmp = await svc.compareRecords(engineer, ids);
		expect(cmp.rows.find((r) => r.key === 'process')?.values.length).toBe(2);
		await expect(svc.compareRecords(outsider, ids)).rejects.toThrow(/not in your shop/);
	});
});
