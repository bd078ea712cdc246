// A D1.1 PQR's coupon read by D1.1 (issue 15). Check values with their source.
import { describe, expect, it } from 'vitest';
import { pqrValuesSchema, type PqrValues } from '$lib/schemas/pqr';
import { d11ResultSet } from './pqr-d11';

const values = (over: Partial<PqrValues>): PqrValues =>
	pqrValuesSchema.parse({
		v: 1,
		process: 'GMAW',
		currentType: 'DCEP',
		transfer: 'short-circuit',
		amps: 180,
		volts: 19.5,
		travelSpeedMmPerS: null,
		wireFeedMmPerS: null,
		fillerClass: 'ER70S-6',
		fillerDiameterMm: null,
		fNumber: null,
		aNumber: null,
		tungstenClass: '',
		tungstenDiameterMm: null,
		gasName: '',
		gasFlowLPerMin: null,
		baseMetalSpec: 'A36',
		baseMetalFamily: null,
		pNumber: null,
		couponThicknessMm: 9.525,
		couponUnit: 'in',
		depositedThicknessMm: null,
		testPosition: '3G',
		jointType: 'butt',
		preheatC: null,
		interpassC: null,
		pwht: '',
		weldedOn: '',
		welder: '',
		lab: '',
		...over
	});
const item = (v: PqrValues, name: string) =>
	d11ResultSet(v, 'imperial').find((i) => i.variable === name);

describe('a D1.1 PQR by D1.1', () => {
	it('PQR-002 (3/8 in, 3G, GMAW-S): 1/8 in to 3/4 in, V only, amps 162-198 A, volts 18.1-20.9 V', () => {
		const v = values({});
		expect(item(v, 'Base metal thickness')!.qualified).toBe('1/8 in – 3/4 in'); // AWS D1.1:2015 Table 4.2 // from memory
		expect(item(v, 'Production positions')!.qualified).toBe('V'); // AWS D1.1:2015 Table 4.1 // from memory
		expect(item(v, 'Amperage')!.qualified).toContain('162–198 A'); // AWS D1.1:2015 Table 4.5 (10 %)
		expect(item(v, 'Voltage')!.qualified).toContain('18.1–20.9 V'); // AWS D1.1:2015 Table 4.5 (7 %)
		expect(item(v, 'Transfer mode')!.qualified).toContain('short-circuit only'); // AWS D1.1:2015 Table 4.5
	});
	it('a 1 in coupon qualifies 1/8 in and over, unlimited', () => {
		const v = values({ couponThicknessMm: 25.4, testPosition: '6G' });
		expect(item(v, 'Base metal thickness')!.qualified).toBe('1/8 in – unlimited'); // AWS D1.1:2015 Table 4.2 // from memory
		expect(item(v, 'Production positions')!.qualified).toBe('F, H, V, OH'); // AWS D1.1:2015 Table 4.1 // from memory
	});
	it('GTAW volts have no D1.1 limit, and it says so', () => {
		const v = values({
			process: 'GTAW',
			transfer: null,
			currentType: 'DCEN',
			volts: 12,
			amps: 120
		});
		expect(item(v, 'Amperage')!.qualified).toContain('90–150 A'); // AWS D1.1:2015 Table 4.5 (25 %, GTAW)
		expect(item(v, 'Voltage')!.qualified).toBe('no D1.1 limit modelled for GTAW');
		expect(item(v, 'Transfer mode')).toBeUndefined();
	});
	it('a coupon under 1/8 in says D1.1 has no row, and nothing is empty or inverted', () => {
		const v = values({ couponThicknessMm: 1.6 });
		expect(item(v, 'Base metal thickness')!.notes.join(' ')).toContain('1/8 in'); // from memory
		for (const i of d11ResultSet(v, 'metric')) expect(i.qualified.length).toBeGreaterThan(0);
	});
});
