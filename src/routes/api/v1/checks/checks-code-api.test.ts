import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

// The governing code as an optional input (issue 15). checks-api.test.ts, unchanged, holds the
// v1 contract for callers that send no code.
process.env.DATABASE_FILE = join(mkdtempSync(join(tmpdir(), 'beadline-checks-code-')), 't.sqlite');
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
function call(handler: unknown, body: unknown) {
	const url = new URL('http://localhost/api/v1/checks');
	const request = new Request(url, {
		method: 'POST',
		headers: { 'content-type': 'application/json' },
		body: JSON.stringify(body)
	});
	const event = { request, url, locals: { user: member } };
	return (handler as (e: unknown) => Promise<Response>)(event);
}

describe('POST /api/v1/checks with a code', () => {
	const body = {
		process: 'GMAW',
		amps: 200,
		volts: 24,
		travelSpeed: { value: 5, unit: 'mm/s' },
		thickness: { value: 30, unit: 'mm' },
		chemistry: { C: 0.18, Mn: 1.4 },
		hydrogen: 5
	};
	it('without a code: the v1 keys only', async () => {
		const res = await call(checks, body);
		expect(Object.keys(await res.json()).sort()).toEqual(['derived', 'findings']);
	});
	it('D1.1: says plainly which variables it has no rule for', async () => {
		const r = await (await call(checks, { ...body, code: 'AWS D1.1' })).json();
		expect(r.code).toEqual({ id: 'aws-d1.1', label: 'AWS D1.1' });
		const travel = r.codeRules.find((x: { variable: string }) => x.variable === 'travelSpeed');
		expect(travel.message).toContain('No D1.1 rule modelled for this variable');
	});
	it('ISO 15614-1: adds the EN 1011-2 CET preheat', async () => {
		const r = await (await call(checks, { ...body, code: 'iso-15614-1' })).json();
		// Q = 0.8 x 24 x 200 / 5 / 1000 = 0.768 kJ/mm (ISO/TR 17671-1 k = 0.8 for 135);
		// Tp = 697(0.32) + 160 tanh(30/35) + 62(5^0.35) + (53(0.32) - 32)(0.768) - 328 (EN 1011-2 C.3)
		expect(r.cetPreheat.cet).toBeCloseTo(0.32, 3);
		expect(r.cetPreheat.preheatC).toBeCloseTo(103.6, 1);
	});
	it('refuses an unknown code with a field error', async () => {
		const res = await call(checks, { ...body, code: 'EN 287' });
		expect(res.status).toBe(400);
		expect((await res.json()).errors.code).toBeDefined();
	});
});

describe('POST /api/v1/checks/pqr-ranges with a code', () => {
	const coupon = {
		process: 'GMAW',
		couponThickness: { value: 10, unit: 'mm' },
		depositedThickness: { value: 10, unit: 'mm' }
	};
	it('asme-ix answers exactly as without a code', async () => {
		const a = await (await call(pqrRanges, coupon)).json();
		const b = await (await call(pqrRanges, { ...coupon, code: 'asme-ix' })).json();
		expect(b).toEqual(a);
	});
	it('ISO 15614-1: 3 to 2t for a 10 mm multi-run coupon (ISO 15614-1:2017 Table 7)', async () => {
		const r = await (await call(pqrRanges, { ...coupon, code: 'iso-15614-1' })).json();
		expect(r.baseMetal).toEqual({ min: { value: 3, unit: 'mm' }, max: { value: 20, unit: 'mm' } });
		expect(r.row).toContain('ISO 15614-1');
	});
	it('D1.1: 1 in and over qualifies unlimited thickness (Table 4.2) // from memory', async () => {
		const r = await (
			await call(pqrRanges, {
				...coupon,
				couponThickness: { value: 1, unit: 'in' },
				depositedThickness: { value: 1, unit: 'in' },
				code: 'aws-d1.1'
			})
		).json();
		expect(r.baseMetal).toEqual({ min: { value: 0.125, unit: 'in' }, max: null });
	});
	it('shop practice: a 400 that says no rule applies', async () => {
		const res = await call(pqrRanges, { ...coupon, code: 'shop' });
		expect(res.status).toBe(400);
		expect((await res.json()).errors.code[0]).toContain('no code rule');
	});
});

describe('POST /api/v1/checks/welder-positions with a code', () => {
	it('no code and asme-ix answer the same', async () => {
		const a = await (await call(welderPositions, { testPositions: ['3G'] })).json();
		const b = await (
			await call(welderPositions, { testPositions: ['3G'], code: 'asme-ix' })
		).json();
		expect(b).toEqual(a);
	});
	it('ISO 9606-1: PF butt qualifies PA and PF (ISO 9606-1:2012 Table 9)', async () => {
		const r = await (
			await call(welderPositions, { testPositions: ['PF'], code: 'ISO 9606-1' })
		).json();
		expect(r.qualified).toEqual(['PA', 'PF']);
	});
	it('ISO 9606-1 refuses ASME positions; D1.1 says it has no rule', async () => {
		expect(
			(await call(welderPositions, { testPositions: ['3G'], code: 'iso-9606-1' })).status
		).toBe(400);
		const d = await call(welderPositions, { testPositions: ['3G'], code: 'aws-d1.1' });
		expect(d.status).toBe(400);
		expect((await d.json()).errors.code[0]).toContain('No D1.1 welder position rule');
	});
});
