// The list's filters, sort and pages, on a small known set of records in two shops.
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-list-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const { settingsRecordSchema, readFilters } = await import('$lib/schemas/settings-record');
const { newShop, addMember } = await import('../people/test-support');
const svc = await import('./index');

type Actor = Awaited<ReturnType<typeof addMember>>;
let ann: Actor, ben: Actor, outsider: Actor, pager: Actor;
const ids: Record<'frame' | 'rail' | 'trailer' | 'gusset', number> = {
	frame: 0,
	rail: 0,
	trailer: 0,
	gusset: 0
};

const form = (over: Record<string, string>) =>
	settingsRecordSchema.parse({ thickness: '1/8', ...over });

// Four records that differ in every filtered column; the other shop holds look-alikes.
const FRAME = {
	process: 'GTAW',
	baseMetalSpec: 'A36',
	fillerClass: 'ER70S-2',
	position: '1G',
	outcome: 'sound',
	amps: '120',
	weldedOn: '2025-01-10',
	jobRef: 'frame bracket'
};
const RAIL = {
	process: 'GTAW',
	baseMetalSpec: '304L',
	fillerClass: 'ER308L',
	position: '2F',
	outcome: 'needs rework',
	amps: '90',
	weldedOn: '2025-02-15',
	jobRef: 'rail post'
};
const TRAILER = {
	process: 'GMAW',
	baseMetalSpec: '6061',
	fillerClass: 'ER4043',
	fillerDiameter: '0.035',
	position: '2F',
	outcome: 'rejected, crack at toe',
	amps: '160',
	weldedOn: '2025-03-20',
	jobRef: 'trailer bracket'
};
const GUSSET = {
	process: 'SMAW',
	baseMetalSpec: 'A36',
	fillerClass: 'E7018',
	position: '3G',
	outcome: 'sound',
	amps: '110',
	weldedOn: '2025-04-25',
	jobRef: 'frame gusset'
};

beforeAll(async () => {
	const a = await newShop('List Test Shop');
	ann = await addMember(a.shopId, 'engineer', 'Ann Author');
	ben = await addMember(a.shopId, 'engineer', 'Ben Author');
	ids.frame = (await svc.createRecord(ann, form(FRAME))).id;
	ids.rail = (await svc.createRecord(ann, form(RAIL))).id;
	ids.trailer = (await svc.createRecord(ben, form(TRAILER))).id;
	ids.gusset = (await svc.createRecord(ben, form(GUSSET))).id;
	const b = await newShop('List Other Shop');
	outsider = await addMember(b.shopId, 'engineer');
	for (const r of [FRAME, RAIL, TRAILER, GUSSET]) await svc.createRecord(outsider, form(r));
	const p = await newShop('List Pages Shop');
	pager = await addMember(p.shopId, 'engineer');
	for (let day = 1; day <= 30; day++)
		await svc.createRecord(
			pager,
			form({ process: 'GTAW', amps: '100', weldedOn: `2025-05-${String(day).padStart(2, '0')}` })
		);
});

/** The ids of the first page for a query string, as the list page reads it from the URL. */
async function listed(q: string, actor = ann, strategy?: 'walk' | 'sort') {
	const list = await svc.listRecords(actor, readFilters(new URLSearchParams(q)), { strategy });
	return list.rows.map((r) => r.id);
}
const sorted = (xs: number[]) => [...xs].sort((x, y) => x - y);

describe('records list filters (own shop only)', () => {
	it('filters by base metal family', async () => {
		expect(await listed('family=stainless')).toEqual([ids.rail]); // 304L: stainless, P-No. 8
		expect(await listed('family=aluminium')).toEqual([ids.trailer]);
		expect(sorted(await listed('family=carbon-steel'))).toEqual([ids.frame, ids.gusset]);
	});

	it('filters by filler, whatever its case', async () => {
		expect(await listed('filler=er308l')).toEqual([ids.rail]);
		expect(await listed('filler=E7018')).toEqual([ids.gusset]);
	});

	it('filters by position, walked or sorted alike', async () => {
		expect(sorted(await listed('position=2F'))).toEqual([ids.rail, ids.trailer]);
		expect(await listed('position=2F', ann, 'walk')).toEqual(
			await listed('position=2F', ann, 'sort')
		);
		expect(await listed('position=4G')).toEqual([]);
	});

	it('filters by the outcome kind read from the own words', async () => {
		expect(await listed('outcome=rework')).toEqual([ids.rail]); // "needs rework"
		expect(await listed('outcome=rejected')).toEqual([ids.trailer]); // "rejected, crack at toe"
		expect(sorted(await listed('outcome=sound'))).toEqual([ids.frame, ids.gusset]);
	});

	it('filters by author', async () => {
		expect(sorted(await listed(`author=${ben.id}`))).toEqual([ids.trailer, ids.gusset]);
		expect(await listed(`author=${outsider.id}`)).toEqual([]); // not a member of this shop
	});

	it('filters by a date range with both ends included, walked or sorted alike', async () => {
		const q = 'from=2025-02-15&to=2025-03-20';
		expect(await listed(q)).toEqual([ids.trailer, ids.rail]); // newest first by default
		expect(await listed(q, ann, 'walk')).toEqual(await listed(q, ann, 'sort'));
		expect(sorted(await listed('from=2025-03-01'))).toEqual([ids.trailer, ids.gusset]);
		expect(sorted(await listed('to=2025-01-31'))).toEqual([ids.frame]);
	});

	it('searches for every word of q, in any case and order', async () => {
		expect(await listed('q=bracket frame')).toEqual([ids.frame]);
		expect(sorted(await listed('q=BRACKET'))).toEqual([ids.frame, ids.trailer]);
		expect(await listed('q=crack trailer')).toEqual([ids.trailer]); // outcome words count too
		expect(await listed('q=bracket nowhere')).toEqual([]);
	});

	it('finds words inside words, short words and quotes without error (FTS5 trigram index)', async () => {
		expect(await listed('q=racke')).toEqual([ids.trailer, ids.frame]); // a substring, like LIKE gave
		expect(sorted(await listed('q=er70s-2 1g'))).toEqual([ids.frame]); // 1g: under three letters
		expect(await listed('q=%22bracket')).toEqual([]); // a double quote is text, not syntax
		expect(await listed('q=OR NOT')).toEqual([]); // FTS5 operators are words too
	});

	it('sorts by amps both ways', async () => {
		const up = [ids.rail, ids.gusset, ids.frame, ids.trailer]; // 90, 110, 120, 160 A
		expect(await listed('sort=amps&dir=asc')).toEqual(up);
		expect(await listed('sort=amps&dir=desc')).toEqual([...up].reverse());
	});

	it('never lists another shop’s look-alikes', async () => {
		expect((await svc.listRecords(ann, readFilters(new URLSearchParams()))).total).toBe(4);
		expect(await listed('family=stainless', outsider)).not.toContain(ids.rail);
	});

	it('gives page 2 after PAGE_SIZE rows, and keeps a page past the end on the last', async () => {
		expect(svc.PAGE_SIZE).toBe(25);
		const first = await svc.listRecords(pager, readFilters(new URLSearchParams()));
		const second = await svc.listRecords(pager, readFilters(new URLSearchParams('page=2')));
		expect(first).toMatchObject({ total: 30, pages: 2, page: 1 });
		expect(first.rows.length).toBe(25); // PAGE_SIZE
		expect(second.rows.length).toBe(5); // 30 - 25
		expect(second.page).toBe(2);
		expect(second.rows.map((r) => r.weldedOn)).toEqual([
			'2025-05-05',
			'2025-05-04',
			'2025-05-03',
			'2025-05-02',
			'2025-05-01'
		]);
		const all = [...first.rows, ...second.rows].map((r) => r.id);
		expect(new Set(all).size).toBe(30);
		expect(await listed('page=2', pager, 'walk')).toEqual(await listed('page=2', pager, 'sort'));
		const past = await svc.listRecords(pager, readFilters(new URLSearchParams('page=9')));
		expect(past.page).toBe(2);
	});
});

describe('records list counts (cached under the records version)', () => {
	it('counts a new record and an edited one on the very next list', async () => {
		const shop = await newShop('List Count Shop');
		const cara = await addMember(shop.shopId, 'engineer');
		const total = async (q: string) =>
			(await svc.listRecords(cara, readFilters(new URLSearchParams(q)))).total;
		const a = await svc.createRecord(cara, form(FRAME));
		expect(await total('process=GTAW')).toBe(1);
		expect(await total('process=GTAW')).toBe(1); // the same list again, from the cache
		await svc.createRecord(cara, form(RAIL));
		expect(await total('process=GTAW')).toBe(2);
		await svc.updateRecord(cara, a.id, form({ ...FRAME, process: 'SMAW' }));
		expect(await total('process=GTAW')).toBe(1);
		expect(await total('process=SMAW')).toBe(1);
		expect(await total('')).toBe(2);
	});
});
