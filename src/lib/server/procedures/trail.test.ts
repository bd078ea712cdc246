// The admin's shop-wide audit trail: its filters (as /admin/audit reads them from the URL) and
// the CSV export, against events written the way the services write them.
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-trail-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { audit } = await import('../audit');
const { AuditEvent } = await import('../models');
const { readTrailFilters } = await import('$lib/schemas/audit');
const { shopTrail, shopTrailCsv } = await import('./trail');
const T = await import('./test-support');

type People = Awaited<ReturnType<typeof T.shopWithPeople>>;
let a: People, b: People;

const filters = (query: string) => readTrailFilters(new URLSearchParams(query));

/** Reads the export back (RFC 4180: quoted cells, doubled quotes, CRLF between rows). */
function rowsOf(csv: string): string[][] {
	const rows: string[][] = [];
	let row: string[] = [];
	let cell = '';
	let quoted = false;
	for (let i = 0; i < csv.length; i++) {
		const c = csv[i]!;
		if (quoted && c === '"' && csv[i + 1] === '"') {
			cell += '"';
			i++;
		} else if (c === '"') quoted = !quoted;
		else if (!quoted && c === ',') {
			row.push(cell);
			cell = '';
		} else if (!quoted && c === '\r' && csv[i + 1] === '\n') {
			rows.push([...row, cell]);
			row = [];
			cell = '';
			i++;
		} else cell += c;
	}
	return rows;
}

beforeAll(async () => {
	a = await T.shopWithPeople('Trail Shop');
	b = await T.shopWithPeople('Other Trail Shop');
	const by = (u: { id: string; name: string }) => ({ id: u.id, name: u.name });
	await audit(
		{
			shopId: a.shopId,
			actor: by(a.engineer),
			action: 'procedure.created',
			objectType: 'procedure',
			objectId: 101,
			after: { number: 'WPS-T1', title: '=HYPERLINK("x")' }
		},
		null
	);
	await audit(
		{
			shopId: a.shopId,
			actor: by(a.inspector),
			action: 'procedure_revision.approved',
			objectType: 'procedure_revision',
			objectId: 202,
			before: { state: 'in-review' },
			after: { state: 'approved' }
		},
		null
	);
	await audit(
		{
			shopId: a.shopId,
			actor: by(a.engineer),
			action: 'pqr.created',
			objectType: 'pqr',
			objectId: 303,
			after: { number: 'PQR-T1' }
		},
		null
	);
	await audit(
		{
			shopId: a.shopId,
			actor: by(a.engineer),
			action: 'procedure_revision.updated',
			objectType: 'procedure_revision',
			objectId: 204,
			before: { variables: { electrical: { amps: { min: 110, max: 130 } } } },
			after: { variables: { electrical: { amps: { min: 115, max: 130 } } } }
		},
		null
	);
	await audit(
		{
			shopId: a.shopId,
			actor: by(a.engineer),
			action: 'settings_record.updated',
			objectType: 'settings_record',
			objectId: 505,
			before: { thicknessMm: 3.175 },
			after: { thicknessMm: 4.7625 }
		},
		null
	);
	// An old one, for the date filters (written straight, as the trail only ever appends).
	await AuditEvent.create({
		shopId: a.shopId,
		actorId: a.engineer.id,
		actorName: a.engineer.name,
		action: 'procedure.created',
		objectType: 'procedure',
		objectId: '100',
		before: null,
		after: JSON.stringify({ number: 'WPS-T0' }),
		ip: null,
		userAgent: null,
		at: new Date('2024-03-05T12:00:00Z')
	});
	await audit(
		{
			shopId: b.shopId,
			actor: by(b.engineer),
			action: 'procedure.created',
			objectType: 'procedure',
			objectId: 909,
			after: { number: 'WPS-OTHER' }
		},
		null
	);
});

describe('the shop-wide trail', () => {
	it('filters by a part of the action, newest first, and shows only the shop’s events', async () => {
		const t = await shopTrail(a.admin, filters('action=procedure.created'));
		expect(t.rows.map((r) => r.objectId)).toEqual(['100', '101']);
		expect(t.total).toBe(2);
		expect(t.rows.every((r) => r.action === 'procedure.created')).toBe(true);
		const part = await shopTrail(a.admin, filters('action=approved'));
		expect(part.rows).toMatchObject([
			{
				actor: a.inspector.name,
				objectId: '202',
				changes: [{ path: 'state', before: 'in-review', after: 'approved' }]
			}
		]);
	});

	it('filters by object type, actor, object id and UTC day', async () => {
		expect((await shopTrail(a.admin, filters('type=pqr'))).rows.map((r) => r.objectId)).toEqual([
			'303'
		]);
		const byActor = await shopTrail(a.admin, filters(`actor=${encodeURIComponent('Inspector')}`));
		expect(byActor.rows.map((r) => r.action)).toEqual(['procedure_revision.approved']);
		expect((await shopTrail(a.admin, filters('object=101'))).total).toBe(1);
		const day = await shopTrail(a.admin, filters('from=2024-03-05&to=2024-03-05'));
		expect(day.rows.map((r) => r.objectId)).toEqual(['100']);
		expect((await shopTrail(a.admin, filters('to=2024-03-04'))).total).toBe(0);
		// Another shop's event never shows, whatever the filter.
		expect((await shopTrail(a.admin, filters('object=909'))).total).toBe(0);
		expect((await shopTrail(b.admin, filters('object=909'))).total).toBe(1);
	});

	it('drops a filter that does not read instead of failing', async () => {
		const f = filters('from=yesterday&page=-3&action=');
		expect([f.from, f.action, f.page]).toEqual([undefined, undefined, 1]);
		// The same as no filter at all (the shop's own setup events included).
		expect((await shopTrail(a.admin, f)).total).toBe((await shopTrail(a.admin, filters(''))).total);
	});
});

describe('the trail in words', () => {
	it('says each event as a sentence, in the reader’s units, beside the raw changes', async () => {
		const [amps] = (await shopTrail(a.admin, filters('object=204'))).rows;
		expect(amps?.words.sentence).toBe(
			`${a.engineer.name} changed amperage, low end: 110 A → 115 A`
		);
		expect(amps?.changes).toEqual([
			{ path: 'variables.electrical.amps.min', before: '110', after: '115' }
		]);
		const imperial = { ...a.admin, unitSystem: 'imperial' as const };
		const metric = { ...a.admin, unitSystem: 'metric' as const };
		const line = async (who: typeof a.admin) =>
			(await shopTrail(who, filters('object=505'))).rows[0]?.words.changes[0]?.line;
		expect(await line(imperial)).toBe('base metal thickness: 1/8 in → 3/16 in'); // 25.4 mm/in (NIST SP 811)
		expect(await line(metric)).toBe('base metal thickness: 3.2 mm → 4.8 mm'); // stored mm, one place
		// Moments read in UTC and say so: shops have no time zone setting.
		expect(amps?.words.at.text).toMatch(/^\d{1,2} [A-Z][a-z]{2} \d{4}, \d{2}:\d{2} UTC$/);
	});

	it('leaves the export raw: codes, paths and stored values', async () => {
		const rows = rowsOf(await shopTrailCsv(a.admin, filters('object=204')));
		expect(rows[1]?.[3]).toBe('procedure_revision.updated');
		expect(JSON.parse(rows[1]![7]!)).toEqual({
			variables: { electrical: { amps: { min: 115, max: 130 } } }
		});
	});
});

describe('the CSV export', () => {
	it('writes the filtered events oldest first under a header, with before and after', async () => {
		const rows = rowsOf(await shopTrailCsv(a.admin, filters('action=procedure.created')));
		expect(rows[0]).toEqual([
			'id',
			'at_utc',
			'actor',
			'action',
			'object_type',
			'object_id',
			'before',
			'after',
			'ip'
		]);
		expect(rows).toHaveLength(3);
		expect(rows.slice(1).map((r) => r[5])).toEqual(['101', '100']); // by id: 101 was written first
		const created = rows.find((r) => r[5] === '101')!;
		expect(created.slice(2, 5)).toEqual([a.engineer.name, 'procedure.created', 'procedure']);
		expect(created[1]).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/);
		expect(rows.some((r) => r.join().includes('WPS-OTHER'))).toBe(false);
	});

	it('quotes JSON cells and never lets a cell start as a formula', async () => {
		const csv = await shopTrailCsv(a.admin, filters('object=101'));
		// The after cell is JSON, so it is quoted with its quotes doubled.
		expect(csv).toContain('"{""number"":""WPS-T1"",""title"":""=HYPERLINK(\\""x\\"")""}"');
		expect(rowsOf(csv)).toHaveLength(2);
		await AuditEvent.create({
			shopId: a.shopId,
			actorId: null,
			actorName: '=SUM(A1:A9)',
			action: 'procedure.created',
			objectType: 'procedure',
			objectId: '-1',
			before: null,
			after: null,
			ip: null,
			userAgent: null
		});
		const hostile = rowsOf(await shopTrailCsv(a.admin, filters('actor=SUM')))[1]!;
		// OWASP CSV injection advice: a leading =, +, - or @ is escaped with a quote character.
		expect(hostile[2]).toBe("'=SUM(A1:A9)");
		expect(hostile[5]).toBe("'-1");
	});
});
