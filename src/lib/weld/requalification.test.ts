import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	checkAgainstRange,
	checkWithinProcedure,
	requalificationTriggers
} from './requalification';
import { speedToMmPerS } from './units';

describe('AWS D1.1 requalification triggers (2015 Table 4.5)', () => {
	it('GMAW amperage: over 10 % needs a new PQR', () => {
		const pqr = { process: 'GMAW' as const, amps: 200 };
		expect(
			requalificationTriggers(pqr, { process: 'GMAW', amps: { min: 180, max: 220 } })[0]?.status
		).toBe('ok'); // exactly 10 %
		const f = requalificationTriggers(pqr, { process: 'GMAW', amps: { min: 180, max: 225 } })[0]; // AWS D1.1:2015 Table 4.5
		expect(f).toMatchObject({
			check: 'requalification',
			status: 'outside',
			value: 225,
			expected: { min: 180, max: 220, unit: 'A' }
		});
	});
	it('GTAW amperage: over 25 %', () => {
		const pqr = { process: 'GTAW' as const, amps: 100 };
		expect(requalificationTriggers(pqr, { process: 'GTAW', amps: 125 })[0]?.status).toBe('ok'); // AWS D1.1:2015 Table 4.5
		expect(requalificationTriggers(pqr, { process: 'GTAW', amps: 126 })[0]?.status).toBe('outside'); // AWS D1.1:2015 Table 4.5
		expect(requalificationTriggers(pqr, { process: 'GTAW', amps: 74 })[0]?.status).toBe('outside'); // AWS D1.1:2015 Table 4.5
	});
	it('voltage over 7 % (GMAW, FCAW)', () => {
		const pqr = { process: 'FCAW' as const, volts: 25 };
		expect(
			requalificationTriggers(pqr, { process: 'FCAW', volts: { max: 26.75 } })[0]?.status
		).toBe('ok');
		expect(requalificationTriggers(pqr, { process: 'FCAW', volts: { max: 27 } })[0]?.status).toBe(
			'outside'
		);
		expect(
			requalificationTriggers({ process: 'GTAW', volts: 12 }, { process: 'GTAW', volts: 20 })
		).toEqual([]); // not modelled for GTAW
	});
	it('current type or polarity, and GMAW transfer mode', () => {
		const a = requalificationTriggers(
			{ process: 'GMAW', currentType: 'DCEP', transfer: 'spray' },
			{ process: 'GMAW', currentType: 'DCEN', transfer: 'short-circuit' }
		);
		expect(a.map((f) => [f.field, f.status])).toEqual([
			['currentType', 'outside'],
			['transfer', 'outside']
		]);
		const b = requalificationTriggers(
			{ process: 'GTAW', transfer: 'spray' },
			{ process: 'GTAW', transfer: 'short-circuit' }
		);
		expect(b).toEqual([]);
	});
	it('a different process is not compared', () => {
		expect(
			requalificationTriggers({ process: 'GMAW', amps: 100 }, { process: 'GTAW', amps: 300 })
		).toEqual([]);
	});
});

describe('within the procedure', () => {
	it('checks a value against a range with no tolerance', () => {
		expect(
			checkAgainstRange(
				135,
				{ min: 115, max: 135 },
				{ field: 'amps', label: 'Amperage', unit: 'A' }
			)?.status
		).toBe('ok');
		expect(
			checkAgainstRange(
				136,
				{ min: 115, max: 135 },
				{ field: 'amps', label: 'Amperage', unit: 'A' }
			)?.status
		).toBe('outside');
		expect(checkAgainstRange(100, {}, { field: 'amps', label: 'Amperage', unit: 'A' })).toBeNull();
		expect(
			checkAgainstRange(NaN, { min: 1 }, { field: 'amps', label: 'Amperage', unit: 'A' })
		).toBeNull();
	});
	it('checks a record against its procedure, in the user’s units', () => {
		const s = {
			process: 'GTAW' as const,
			amps: 140,
			volts: 12,
			travelSpeedMmPerS: speedToMmPerS(5, 'in/min'),
			procedure: {
				amps: { min: 115, max: 135 },
				volts: { min: 10, max: 14 },
				travelSpeedMmPerS: { min: speedToMmPerS(3, 'in/min'), max: speedToMmPerS(6, 'in/min') }
			}
		};
		const f = checkWithinProcedure({ s, system: 'imperial' });
		expect(f.map((x) => [x.field, x.status])).toEqual([
			['amps', 'outside'],
			['volts', 'ok'],
			['travelSpeed', 'ok']
		]);
		expect(f[0]?.message).toBe('Amperage 140 A is above the procedure range (115–135 A).');
		expect(f[2]).toMatchObject({ value: 5, expected: { min: 3, max: 6, unit: 'in/min' } });
		const m = checkWithinProcedure({ s, system: 'metric' });
		expect(m[2]?.expected.unit).toBe('mm/min');
	});
});

it('never throws (fast-check)', () => {
	fc.assert(
		fc.property(fc.anything(), fc.anything(), (a, b) => {
			requalificationTriggers(a as never, b as never); // AWS D1.1:2015 Table 4.5
		})
	);
});
