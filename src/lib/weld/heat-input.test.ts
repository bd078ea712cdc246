import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	arcEnergyKJPerMm,
	asmeHeatInputJPerIn,
	checkHeatInput,
	heatInput,
	kFactor,
	maxArcEnergyJPerMm
} from './heat-input';
import { speedToMmPerS } from './units';

describe('ASME IX QW-409.1(a): J/in = V x A x 60 / travel (in/min)', () => {
	it('24 V, 120 A, 10 in/min -> 17,280 J/in', () => {
		expect(asmeHeatInputJPerIn(24, 120, 10)).toBe(17280); // ASME BPVC IX QW-409.1
	});
	it('12 V, 125 A, 4 in/min -> 22,500 J/in (the API contract example)', () => {
		expect(asmeHeatInputJPerIn(12, 125, 4)).toBe(22500); // ASME BPVC IX QW-409.1
	});
	it('no result for zero, negative or non-finite input', () => {
		for (const bad of [0, -1, NaN, Infinity]) {
			expect(asmeHeatInputJPerIn(bad, 120, 10)).toBeNull();
			expect(asmeHeatInputJPerIn(24, bad, 10)).toBeNull();
			expect(asmeHeatInputJPerIn(24, 120, bad)).toBeNull();
		}
	});
});

describe('ISO/TR 17671-1 (EN 1011-1): Q = k x U x I / v', () => {
	it('k factors by process', () => {
		expect(kFactor('GTAW').k).toBe(0.6); // ISO/TR 17671-1 process 141
		expect(kFactor('GMAW').k).toBe(0.8); // ISO/TR 17671-1 processes 131/135
		expect(kFactor('FCAW').k).toBe(0.8); // ISO/TR 17671-1 process 136
		expect(kFactor('SMAW').k).toBe(0.8); // ISO/TR 17671-1 process 111
		expect(kFactor('GTAW').iso4063).toBe(141);
	});
	it('the contract example: 12 V, 125 A, 4 in/min, GTAW', () => {
		expect(heatInput('GTAW', 12, 125, speedToMmPerS(4, 'in/min'))).toEqual({
			asmeJPerIn: 22500, // ASME BPVC IX QW-409.1
			arcEnergyKJPerMm: 0.886, // 1500 W / 1.6933 mm/s
			isoKJPerMm: 0.531, // ISO/TR 17671-1, k = 0.6
			k: 0.6
		});
	});
	it('arc energy in kJ/mm equals QW-409.1 J/in divided by 25,400', () => {
		const e = arcEnergyKJPerMm(24, 120, speedToMmPerS(10, 'in/min'));
		expect(e).toBeCloseTo(17280 / 25400, 12); // 0.680 kJ/mm
	});
	it('GMAW at 24 V, 250 A, 300 mm/min: arc energy 1.2 kJ/mm, heat input 0.96 kJ/mm', () => {
		const h = heatInput('GMAW', 24, 250, 5);
		expect(h?.arcEnergyKJPerMm).toBe(1.2);
		expect(h?.isoKJPerMm).toBe(0.96); // ISO/TR 17671-1, k = 0.8
	});
});

describe('procedure maximum', () => {
	it('uses the highest amps and volts with the lowest travel speed', () => {
		expect(
			maxArcEnergyJPerMm({ volts: { max: 14 }, amps: { max: 140 }, travelSpeedMmPerS: { min: 2 } })
		).toBeCloseTo(980, 9);
		expect(
			maxArcEnergyJPerMm({ volts: {}, amps: { max: 140 }, travelSpeedMmPerS: { min: 2 } })
		).toBeNull();
	});
	it('flags a record above the procedure maximum, in the user’s units', () => {
		const s = {
			process: 'GTAW' as const,
			volts: 12,
			amps: 125,
			travelSpeedMmPerS: speedToMmPerS(4, 'in/min')
		};
		const over = checkHeatInput({
			s: { ...s, procedure: { heatInputMax: { jPerMm: 800, basis: 'asme' } } },
			system: 'imperial'
		});
		expect(over?.status).toBe('outside');
		expect(over?.value).toBe(22500);
		expect(over?.expected).toEqual({ max: 20320, unit: 'J/in' });
		const isoOk = checkHeatInput({
			s: { ...s, procedure: { heatInputMax: { jPerMm: 800, basis: 'iso' } } },
			system: 'metric'
		});
		expect(isoOk?.status).toBe('ok');
		expect(isoOk?.value).toBe(531);
		expect(checkHeatInput({ s, system: 'metric' })).toBeNull(); // no maximum set: left out
	});
});

describe('properties (fast-check)', () => {
	const v = fc.double({ min: 5, max: 60, noNaN: true });
	const a = fc.double({ min: 5, max: 600, noNaN: true });
	const s = fc.double({ min: 0.5, max: 50, noNaN: true });
	it('heat input rises with amps', () => {
		fc.assert(
			fc.property(v, a, a, s, (volts, a1, a2, speed) => {
				const [lo, hi] = a1 < a2 ? [a1, a2] : [a2, a1];
				const e1 = arcEnergyKJPerMm(volts, lo, speed) ?? NaN;
				const e2 = arcEnergyKJPerMm(volts, hi, speed) ?? NaN;
				expect(e2).toBeGreaterThanOrEqual(e1);
			})
		);
	});
	it('heat input falls as travel speed rises', () => {
		fc.assert(
			fc.property(v, a, s, s, (volts, amps, s1, s2) => {
				const [slow, fast] = s1 < s2 ? [s1, s2] : [s2, s1];
				const e1 = asmeHeatInputJPerIn(volts, amps, slow) ?? NaN;
				const e2 = asmeHeatInputJPerIn(volts, amps, fast) ?? NaN;
				expect(e2).toBeLessThanOrEqual(e1);
			})
		);
	});
	it('never throws, whatever it is given', () => {
		fc.assert(
			fc.property(fc.double(), fc.double(), fc.double(), (x, y, z) => {
				asmeHeatInputJPerIn(x, y, z);
				arcEnergyKJPerMm(x, y, z);
				heatInput('GMAW', x, y, z);
			})
		);
	});
});
