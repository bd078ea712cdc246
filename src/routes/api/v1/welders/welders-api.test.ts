import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

// The welders API's handlers called as SvelteKit would, with bearer tokens of two shops.
const dir = mkdtempSync(join(tmpdir(), 'beadline-welders-api-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');

const T = await import('$lib/server/procedures/test-support');
const { createApiToken } = await import('$lib/server/api/api-tokens');
const { addDays, localDay } = await import('$lib/server/welders/dates');
const welders = await import('./+server');
const { POST: addQualification } = await import('./[id=id]/qualifications/+server');
const { POST: logUse } = await import('./[id=id]/continuity/+server');

type Handler = (e: never) => Promise<Response>;

/** Six calendar months later, clamped to a shorter month's end (ASME IX QW-322.1, our rule). */
function sixMonthsAfter(day: string): string {
	const [y, m, d] = day.split('-').map(Number) as [number, number, number];
	const last = new Date(Date.UTC(y, m - 1 + 6 + 1, 0)).getUTCDate();
	return new Date(Date.UTC(y, m - 1 + 6, Math.min(d, last))).toISOString().slice(0, 10);
}

async function call(
	handler: Handler,
	token: string,
	opts: { body?: unknown; id?: number; path?: string } = {}
): Promise<{ status: number; body: Record<string, unknown> }> {
	const url = new URL(`http://localhost/api/v1/welders${opts.path ?? ''}`);
	const request = new Request(url, {
		method: opts.body === undefined ? 'GET' : 'POST',
		headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json' },
		body: opts.body === undefined ? undefined : JSON.stringify(opts.body)
	});
	const event = {
		request,
		url,
		params: opts.id === undefined ? {} : { id: String(opts.id) },
		locals: { user: null },
		getClientAddress: () => '127.0.0.1'
	};
	const res = await handler(event as never);
	return { status: res.status, body: await res.json() };
}

let engineer: string, inspector: string, welderToken: string, otherShop: string;

beforeAll(async () => {
	const a = await T.shopWithPeople('Welders API Shop');
	const b = await T.shopWithPeople('Other Welders API Shop');
	const token = async (people: typeof a, role: 'engineer' | 'inspector' | 'welder') =>
		(await createApiToken(people.admin, { name: `${role} client`, role }, null)).secret;
	[engineer, inspector, welderToken, otherShop] = await Promise.all([
		token(a, 'engineer'),
		token(a, 'inspector'),
		token(a, 'welder'),
		token(b, 'engineer')
	]);
});

const today = localDay();
const GTAW_3G = {
	process: 'GTAW',
	code: 'ASME IX',
	testDate: addDays(today, -60),
	wpsRef: 'WPS-API-01',
	testPositions: ['3G'],
	couponType: 'plate',
	couponThickness: '3/8',
	depositThickness: '3/8',
	fillerClass: 'ER70S-2'
};

describe('/api/v1/welders', () => {
	it('creates a welder, a qualification and a use, and lists them with status', async () => {
		const made = await call(welders.POST as Handler, engineer, {
			body: { name: 'Odile Marsh', stamp: 'API-01' }
		});
		expect(made.status).toBe(201);
		expect(made.body).toMatchObject({ name: 'Odile Marsh', stamp: 'API-01' });
		const id = made.body.id as number;

		const q = await call(addQualification as Handler, engineer, { id, body: GTAW_3G });
		expect(q.status).toBe(201);
		expect(q.body.id).toEqual(expect.any(Number));

		const listed = async (token: string) =>
			((await call(welders.GET as Handler, token)).body.welders as { id: number }[]).find(
				(w) => w.id === id
			) as { qualifications: Record<string, unknown>[] } | undefined;
		expect((await listed(inspector))?.qualifications).toMatchObject([
			{
				process: 'GTAW',
				code: 'ASME IX',
				testPositions: ['3G'],
				status: 'current',
				lapsesOn: sixMonthsAfter(GTAW_3G.testDate) // ASME IX QW-322.1: six months from the test
			}
		]);

		const use = { process: 'GTAW', usedOn: today, note: 'Trailer frame, job 88' };
		const logged = await call(logUse as Handler, engineer, { id, body: use });
		expect(logged.status).toBe(201);
		expect(logged.body).toMatchObject({
			welderId: id,
			process: 'GTAW',
			usedOn: today,
			created: true
		});
		// The same use again is the same entry: 200, nothing added.
		const again = await call(logUse as Handler, engineer, { id, body: use });
		expect(again).toMatchObject({ status: 200, body: { created: false } });

		const after = await listed(engineer);
		expect(after?.qualifications[0]).toMatchObject({
			status: 'current',
			lastActivity: today,
			lapsesOn: sixMonthsAfter(today) // ASME IX QW-322.1: six months from the last use
		});
		// Another shop's token neither lists the welder nor can add to it.
		expect(await listed(otherShop)).toBeUndefined();
		expect((await call(addQualification as Handler, otherShop, { id, body: GTAW_3G })).status).toBe(
			404
		);
		expect((await call(logUse as Handler, otherShop, { id, body: use })).status).toBe(404);
	});

	it('answers bad input with 400 and field errors, a taken stamp too', async () => {
		const bad = await call(welders.POST as Handler, engineer, {
			body: { name: ' ', stamp: 'no*stars', email: 'not-an-address' }
		});
		expect(bad.status).toBe(400);
		expect(Object.keys(bad.body.errors as object).sort()).toEqual(['email', 'name', 'stamp']);

		const first = await call(welders.POST as Handler, engineer, {
			body: { name: 'Pell Auden', stamp: 'API-02' }
		});
		expect(first.status).toBe(201);
		const taken = await call(welders.POST as Handler, engineer, {
			body: { name: 'Someone Else', stamp: 'API-02' }
		});
		expect(taken).toMatchObject({
			status: 400,
			body: { errors: { stamp: ['Another welder of the shop has this ID or stamp.'] } }
		});

		const id = first.body.id as number;
		const q = await call(addQualification as Handler, engineer, {
			id,
			body: {
				...GTAW_3G,
				testDate: addDays(today, 5),
				testPositions: ['6G'], // a pipe position on a plate coupon (QW-461.9)
				couponThickness: '',
				depositThickness: 'thick'
			}
		});
		expect(q.status).toBe(400);
		expect(Object.keys(q.body.errors as object).sort()).toEqual([
			'couponThickness',
			'depositThickness',
			'testDate',
			'testPositions'
		]);

		const use = await call(logUse as Handler, engineer, {
			id,
			body: { process: 'TIG', usedOn: '', note: '' }
		});
		expect(use.status).toBe(400);
		expect(Object.keys(use.body.errors as object).sort()).toEqual(['note', 'process', 'usedOn']);

		const notJson = await call(welders.POST as Handler, engineer, { body: 'plain' });
		expect(notJson.status).toBe(400);
	});

	it('lets only engineers and admins write, and a welder token not even read', async () => {
		const body = { name: 'Quin Ardent', stamp: 'API-03' };
		expect((await call(welders.POST as Handler, inspector, { body })).status).toBe(403);
		expect((await call(welders.POST as Handler, welderToken, { body })).status).toBe(403);
		expect((await call(welders.GET as Handler, welderToken)).status).toBe(403);
		expect((await call(welders.GET as Handler, 'bl_unknown')).status).toBe(401);
	});
});
