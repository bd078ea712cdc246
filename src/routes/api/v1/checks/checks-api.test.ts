import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

// The handlers touch the database only for bearer tokens; a throw-away file keeps it clean.
process.env.DATABASE_FILE = join(
	mkdtempSync(join(tmpdir(), 'beadline-checks-api-')),
	'test.sqlite'
);

await (await import('$lib/server/db')).migrate();
const { POST: checks } = await import('./+server');
const { POST: pqrRanges } = await import('./pqr-ranges/+server');
const { POST: welderPositions } = await import('./welder-positions/+server');

const member = {
	id: '00000000-0000-4000-8000-000000000001',
	shopId: 1,
	shopName: 'Test shop',
	name: 'Test engineer',
	email: 'e@test.example',
	role: 'engineer' as const,
	unitSystem: 'imperial' as const
};

function call(
	handler: (e: never) => Promise<Response> | Response,
	body: unknown,
	opts: { user?: typeof member | null; type?: string; raw?: string } = {}
) {
	const url = new URL('http://localhost/api/v1/checks');
	const request = new Request(url, {
		method: 'POST',
		headers: { 'content-type': opts.type ?? 'application/json' },
		body: opts.raw ?? JSON.stringify(body)
	});
	const event = { request, url, locals: { user: opts.user === undefined ? member : opts.user } };
	return handler(event as unknown as never) as Promise<Response>;
}

// The example body of the API contract (shared/BRIEF.md, "The checks API (v1)").
const CONTRACT_EXAMPLE = {
	process: 'GTAW',
	currentType: 'DCEN',
	amps: 125,
	volts: 12,
	travelSpeed: { value: 4, unit: 'in/min' },
	thickness: { value: 0.125, unit: 'in' },
	baseMetal: { spec: 'A36' },
	filler: { classification: 'ER70S-6', diameter: { value: 0.09375, unit: 'in' } },
	tungsten: { classification: 'EWLa-1.5', diameter: { value: 2.4, unit: 'mm' } },
	gas: { name: 'argon', flow: { value: 20, unit: 'CFH' } }
};

describe('POST /api/v1/checks', () => {
	it('answers the contract example with the documented shape', async () => {
		const res = await call(checks as never, CONTRACT_EXAMPLE);
		expect(res.status).toBe(200);
		const body = await res.json();
		const amps = body.findings.find((f: { check: string }) => f.check === 'amps-vs-thickness');
		// 1 A per 0.001 in, ±25 % — common practice, no source; the contract's example numbers.
		expect(amps).toMatchObject({
			status: 'ok',
			value: 125,
			expected: { min: 94, max: 156, unit: 'A' }
		});
		expect(amps.source).toMatchObject({ kind: 'common practice' });
		for (const f of body.findings) {
			expect(Object.keys(f)).toEqual(
				expect.arrayContaining(['check', 'status', 'message', 'value', 'expected', 'source'])
			);
			expect(['ok', 'caution', 'outside']).toContain(f.status);
			expect(['published', 'common practice', 'from memory']).toContain(f.source.kind);
		}
		// ASME IX QW-409.1(a): 12 V × 125 A × 60 / 4 in/min = 22,500 J/in; ISO/TR 17671-1 k = 0.6 for 141.
		expect(body.derived.heatInput).toEqual({
			asmeJPerIn: 22500,
			arcEnergyKJPerMm: 0.886,
			isoKJPerMm: 0.531,
			k: 0.6
		});
		// OSHA 29 CFR 1910.133(a)(5): GTAW 50–150 A minimum shade 8; ANSI Z49.1 / AWS F2.2 suggests 12.
		expect(body.derived.shade).toEqual({ minimum: 8, suggested: 12 });
		// AWS A5.18: ER70S-6 → 70 ksi; ASME IX QW-432 F-No. 6, QW-442 A-No. 1.
		expect(body.derived.filler).toMatchObject({
			spec: 'AWS A5.18',
			minTensileKsi: 70,
			fNumber: 6,
			aNumber: 1
		});
	});

	it('leaves out checks whose inputs are missing', async () => {
		const res = await call(checks as never, { process: 'GMAW' });
		expect(res.status).toBe(200);
		const body = await res.json();
		expect(body.findings.find((f: { check: string }) => f.check === 'heat-input')).toBeUndefined();
	});

	it('answers 400 with field paths for malformed bodies, never 500', async () => {
		const cases: Array<[unknown, string]> = [
			[{}, 'process'],
			[{ process: 'OXY' }, 'process'],
			[{ process: 'GTAW', amps: 'lots' }, 'amps'],
			[{ process: 'GTAW', thickness: { value: 3, unit: 'furlong' } }, 'thickness.unit'],
			[
				{ process: 'GTAW', filler: { diameter: { value: -1, unit: 'in' } } },
				'filler.diameter.value'
			],
			[{ process: 'GTAW', gas: { flow: { value: '20', unit: 'CFH' } } }, 'gas.flow.value']
		];
		for (const [body, path] of cases) {
			const res = await call(checks as never, body);
			expect(res.status, JSON.stringify(body)).toBe(400);
			const { errors } = await res.json();
			expect(Object.keys(errors), JSON.stringify(body)).toContain(path);
		}
		for (const raw of ['not json', '[1,2', '']) {
			const res = await call(checks as never, null, { raw });
			expect(res.status).toBe(400);
		}
		// Not sent as JSON: the contract's 400 with `errors`, not a 415.
		const plain = await call(checks as never, null, { raw: 'process=GTAW', type: 'text/plain' });
		expect(plain.status).toBe(400);
		expect(await plain.json()).toEqual({
			errors: { '': ['The body must be JSON, sent with content-type application/json.'] }
		});
	});

	it('answers 401 with no session and no token, and for an unknown token', async () => {
		expect((await call(checks as never, CONTRACT_EXAMPLE, { user: null })).status).toBe(401);
		const url = new URL('http://localhost/api/v1/checks');
		const request = new Request(url, {
			method: 'POST',
			headers: { 'content-type': 'application/json', authorization: 'Bearer bl_unknown' },
			body: JSON.stringify(CONTRACT_EXAMPLE)
		});
		const res = await (checks as (e: never) => Promise<Response>)({
			request,
			url,
			locals: { user: null }
		} as never);
		expect(res.status).toBe(401);
	});
});

describe('POST /api/v1/checks/pqr-ranges', () => {
	it('answers QW-451.1 in the unit asked', async () => {
		// ASME IX QW-451.1: coupon 3/8 in → base metal 1/16 in to 2T = 3/4 in; deposited t → 2t.
		const res = await call(pqrRanges as never, {
			process: 'GTAW',
			couponThickness: { value: 0.375, unit: 'in' },
			depositedThickness: { value: 0.25, unit: 'in' }
		});
		expect(res.status).toBe(200);
		const body = await res.json();
		expect(body.baseMetal).toEqual({
			min: { value: 0.0625, unit: 'in' },
			max: { value: 0.75, unit: 'in' }
		});
		expect(body.depositedMax).toEqual({ value: 0.5, unit: 'in' });
		expect(body.source.label).toContain('QW-451.1');
	});

	it('always answers depositedMax, in the deposit unit', async () => {
		// ASME IX QW-451.1: coupon 1 in (3/4 to <1-1/2 in row); t 3/4 in and over -> 2T = 2 in.
		const res = await call(pqrRanges as never, {
			process: 'GTAW',
			couponThickness: { value: 1, unit: 'in' },
			depositedThickness: { value: 20, unit: 'mm' }
		});
		expect(res.status).toBe(200);
		const body = await res.json();
		expect(Object.keys(body)).toEqual(
			expect.arrayContaining(['baseMetal', 'depositedMax', 'source'])
		);
		expect(body.depositedMax).toEqual({ value: 50.8, unit: 'mm' }); // QW-451.1: 2T, 2 in = 50.8 mm
	});

	it('refuses a missing coupon or deposit thickness with a field error', async () => {
		const res = await call(pqrRanges as never, { process: 'GTAW' });
		expect(res.status).toBe(400);
		expect(Object.keys((await res.json()).errors)).toEqual(
			expect.arrayContaining(['couponThickness', 'depositedThickness'])
		);
		// The contract's body carries t and its answer always carries depositedMax, read from t.
		const noT = await call(pqrRanges as never, {
			process: 'GTAW',
			couponThickness: { value: 0.375, unit: 'in' }
		});
		expect(noT.status).toBe(400);
		expect(Object.keys((await noT.json()).errors)).toEqual(['depositedThickness']);
	});
});

describe('POST /api/v1/checks/welder-positions', () => {
	it('answers QW-461.9 for 3G', async () => {
		// ASME IX QW-461.9: 3G plate → groove F, V; fillet F, H, V.
		const res = await call(welderPositions as never, { testPositions: ['3G'] });
		expect(res.status).toBe(200);
		const body = await res.json();
		expect(body.groove).toEqual(['F', 'V']);
		expect(body.fillet).toEqual(['F', 'H', 'V']);
		expect(body.source.label).toContain('QW-461.9');
	});

	it('refuses an unknown position with a field error', async () => {
		const res = await call(welderPositions as never, { testPositions: ['7G'] });
		expect(res.status).toBe(400);
		expect(Object.keys((await res.json()).errors)[0]).toMatch(/^testPositions/);
	});
});
