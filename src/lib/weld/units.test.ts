import convert from 'convert-units';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MSG_STEEL_IN } from '$reference/gauges';
import {
	LPM_PER_CFH,
	MM_PER_IN,
	flowToLPerMin,
	formatFlow,
	formatInches,
	formatLength,
	formatMm,
	formatSpeed,
	formatTemperature,
	gaugeToMm,
	inchFraction,
	lPerMinToFlow,
	mmPerSToSpeed,
	parseFlow,
	parseLength,
	parseSpeed,
	parseTemperature,
	speedToMmPerS,
	temperatureToC
} from './units';

const mm = (text: unknown, unit?: 'in' | 'mm') => {
	const r = parseLength(text, unit);
	return r.ok ? r.mm : r.message;
};

describe('exact constants', () => {
	it('1 in = 25.4 mm exactly', () => {
		expect(MM_PER_IN).toBe(25.4); // NIST Handbook 44 App. C; 16 CFR 500.19
	});
	it('1 CFH = 0.471947 L/min', () => {
		expect(LPM_PER_CFH).toBeCloseTo(0.471947, 6); // from 1 ft = 0.3048 m exactly
		expect(LPM_PER_CFH).toBeCloseTo(0.4719474432, 10);
	});
});

describe('cross-check against the registry library convert-units', () => {
	const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
	it('length in <-> mm', () => {
		for (const v of [1 / 64, 0.035, 0.125, 3 / 16, 1.5, 6, 24]) {
			expect(
				rel(parseLength(`${v} in`).ok ? v * 25.4 : NaN, convert(v).from('in').to('mm'))
			).toBeLessThan(1e-5);
		}
	});
	it('flow CFH <-> L/min', () => {
		for (const v of [11, 20, 25, 35, 60]) {
			expect(rel(flowToLPerMin(v, 'CFH'), convert(v).from('ft3/h').to('l/min'))).toBeLessThan(1e-5);
		}
	});
	it('speed in/min <-> mm/s (through ft/s)', () => {
		for (const v of [4, 10, 200, 400]) {
			const oracle =
				convert(v / 720)
					.from('ft/s')
					.to('m/s') * 1000;
			expect(rel(speedToMmPerS(v, 'in/min'), oracle)).toBeLessThan(1e-5);
		}
	});
	it('temperature °F <-> °C', () => {
		for (const f of [-40, 0, 32, 50, 70, 150, 225, 300]) {
			expect(temperatureToC(f, 'degF')).toBeCloseTo(convert(f).from('F').to('C'), 9);
		}
	});
});

describe('parseLength', () => {
	it('reads inch fractions, mixed numbers and inch marks', () => {
		expect(mm('3/32')).toBeCloseTo(2.38125, 10);
		expect(mm('1-1/2')).toBeCloseTo(38.1, 10);
		expect(mm('1 1/2')).toBeCloseTo(38.1, 10);
		expect(mm('3/16"')).toBeCloseTo(4.7625, 10);
		expect(mm('1/8 in')).toBeCloseTo(3.175, 10);
		expect(mm('½"')).toBeCloseTo(12.7, 10);
		expect(mm('1 ¼ in')).toBeCloseTo(31.75, 10);
	});
	it('reads decimals in either unit, and a decimal comma', () => {
		expect(mm('0.125')).toBeCloseTo(3.175, 10);
		expect(mm('.035 in')).toBeCloseTo(0.889, 10);
		expect(mm('3.2 mm')).toBe(3.2);
		expect(mm('3,2mm')).toBe(3.2);
		expect(mm('3.2', 'mm')).toBe(3.2);
		expect(mm('2.4 millimetres')).toBe(2.4);
	});
	it('takes a bare fraction as inches even when the default unit is mm', () => {
		expect(mm('3/32', 'mm')).toBeCloseTo(2.38125, 10);
	});
	it('reads sheet steel gauge (Manufacturers’ Standard Gauge)', () => {
		expect(mm('16 ga')).toBeCloseTo(0.0598 * 25.4, 10); // MSG 16 ga = 0.0598 in
		expect(mm('#10')).toBeCloseTo(0.1345 * 25.4, 10); // MSG 10 ga = 0.1345 in
		expect(mm('14 gauge')).toBeCloseTo(0.0747 * 25.4, 10); // MSG 14 ga = 0.0747 in
	});
	it('rejects what is not a length, with a message', () => {
		for (const bad of [
			'',
			'abc',
			'3/0',
			'-1/8',
			'0',
			'1/8 furlong',
			'16.5 ga',
			'3/4 ga',
			null,
			{},
			NaN,
			Infinity
		]) {
			const r = parseLength(bad);
			expect(r.ok).toBe(false);
			if (!r.ok) expect(r.message.length).toBeGreaterThan(5);
		}
		expect(parseLength('200 in').ok).toBe(false); // over the 100 in cap
	});
});

describe('gauges', () => {
	it('MSG sheet steel matches the published chart', () => {
		// MSG for sheet steel, 41.82 lb/ft2 per inch
		const published: Record<number, number> = {
			7: 0.1793,
			10: 0.1345,
			11: 0.1196,
			12: 0.1046,
			14: 0.0747,
			16: 0.0598,
			18: 0.0478,
			20: 0.0359,
			21: 0.0329,
			22: 0.0299,
			24: 0.0239,
			26: 0.0179,
			28: 0.0149
		};
		for (const [g, t] of Object.entries(published)) expect(MSG_STEEL_IN[Number(g)]).toBe(t);
	});
	it('aluminium uses Brown & Sharpe (AWG)', () => {
		const g = gaugeToMm(16, 'aluminium'); // ASTM B258: 16 AWG = 0.0508 in
		expect(g.ok && g.mm / 25.4).toBeCloseTo(0.0508, 4);
		const g10 = gaugeToMm(10, 'aluminium'); // 10 AWG = 0.1019 in
		expect(g10.ok && g10.mm / 25.4).toBeCloseTo(0.1019, 4);
	});
	it('tube wall uses BWG', () => {
		const g = gaugeToMm(16, 'tube'); // 16 BWG = 0.065 in (Holtzapffel's BWG table; Engineering ToolBox)
		expect(g.ok && g.mm / 25.4).toBeCloseTo(0.065, 6);
	});
	it('refuses stainless sheet gauge and gauges off the table', () => {
		expect(gaugeToMm(16, 'stainless').ok).toBe(false);
		expect(gaugeToMm(40, 'sheet-steel').ok).toBe(false);
		expect(gaugeToMm(2.5).ok).toBe(false);
	});
});

describe('formatting', () => {
	it('prints inch values as the nearest common fraction when close', () => {
		expect(formatInches(3 / 32)).toBe('3/32 in');
		expect(formatInches(1 / 8)).toBe('1/8 in');
		expect(formatInches(1.5)).toBe('1-1/2 in');
		expect(formatInches(3 / 64)).toBe('3/64 in');
		expect(formatInches(1 / 64)).toBe('1/64 in');
		expect(formatInches(8)).toBe('8 in');
		expect(formatLength(2.4, 'imperial')).toBe('3/32 in'); // 2.4 mm is the metric 3/32
		expect(formatLength(3.2, 'imperial')).toBe('1/8 in');
	});
	it('prints decimals for wire sizes and gauges that are not fractions', () => {
		expect(formatInches(0.035)).toBe('0.035 in');
		expect(formatInches(0.045)).toBe('0.045 in');
		expect(formatInches(0.0598)).toBe('0.060 in');
		expect(formatInches(0.1345)).toBe('0.135 in');
		expect(formatLength(5, 'imperial')).toBe('0.197 in');
		expect(inchFraction(0.04)).toBeNull();
	});
	it('prints mm the way codes do', () => {
		expect(formatLength(25.4 * (3 / 32), 'metric')).toBe('2.4 mm');
		expect(formatLength(25.4 / 8, 'metric')).toBe('3.2 mm');
		expect(formatLength(25.4 / 16, 'metric')).toBe('1.6 mm');
		expect(formatLength(25.4 * 0.75, 'metric')).toBe('19 mm');
		expect(formatMm(5)).toBe('5 mm');
	});
	it('prints flow, speed and temperature in each system', () => {
		expect(formatFlow(flowToLPerMin(20, 'CFH'), 'imperial')).toBe('20 CFH');
		expect(formatFlow(flowToLPerMin(20, 'CFH'), 'metric')).toBe('9.4 L/min');
		expect(formatSpeed(speedToMmPerS(4, 'in/min'), 'imperial')).toBe('4 in/min');
		expect(formatSpeed(speedToMmPerS(4, 'in/min'), 'metric')).toBe('102 mm/min');
		expect(formatSpeed(speedToMmPerS(200, 'in/min'), 'metric', 'wire')).toBe('5.1 m/min');
		expect(formatTemperature(65, 'imperial')).toBe('149 °F');
		expect(formatTemperature(temperatureToC(32, 'degF'), 'metric')).toBe('0 °C');
	});
});

describe('parseFlow, parseSpeed, parseTemperature', () => {
	it('reads the units a shop writes', () => {
		const f = parseFlow('20 CFH');
		expect(f.ok && f.lPerMin).toBeCloseTo(9.43895, 4);
		const l = parseFlow('10 lpm');
		expect(l.ok && l.lPerMin).toBe(10);
		const s = parseSpeed('4 ipm');
		expect(s.ok && s.mmPerS).toBeCloseTo(1.693333, 5);
		const sm = parseSpeed('5.1 m/min');
		expect(sm.ok && sm.mmPerS).toBeCloseTo(85, 6);
		const cm = parseSpeed('12 cm/min');
		expect(cm.ok && cm.mmPerS).toBeCloseTo(2, 9);
		const t = parseTemperature('150 °F');
		expect(t.ok && t.degC).toBeCloseTo(65.5556, 4);
		const c = parseTemperature('-5C');
		expect(c.ok && c.degC).toBe(-5);
	});
	it('rejects bad input with a message', () => {
		for (const bad of ['', 'fast', '0 CFH', '-3', '1e400']) {
			expect(parseFlow(bad).ok).toBe(false);
			expect(parseSpeed(bad).ok).toBe(false);
		}
		expect(parseTemperature('hot').ok).toBe(false);
		expect(parseTemperature('5000 C').ok).toBe(false);
	});
});

describe('properties (fast-check)', () => {
	it('no parser or formatter throws on arbitrary input', () => {
		fc.assert(
			fc.property(fc.anything(), fc.string(), fc.double(), (any, s, d) => {
				for (const x of [any, s, d]) {
					parseLength(x);
					parseFlow(x);
					parseSpeed(x);
					parseTemperature(x);
				}
				formatLength(d, 'imperial');
				formatLength(d, 'metric');
				formatFlow(d, 'imperial');
				formatSpeed(d, 'metric', 'wire');
				formatTemperature(d, 'imperial');
				inchFraction(d);
				gaugeToMm(d);
			})
		);
	});
	it('printed lengths read back to the same text (both systems)', () => {
		fc.assert(
			fc.property(
				fc.double({ min: 0.2, max: 2000, noNaN: true }),
				fc.constantFrom('imperial', 'metric' as const),
				(v, system) => {
					const text = formatLength(v, system as 'imperial' | 'metric');
					const back = parseLength(text);
					expect(back.ok).toBe(true);
					if (back.ok) expect(formatLength(back.mm, system as 'imperial' | 'metric')).toBe(text);
				}
			)
		);
	});
	it('printed flows, speeds and temperatures read back to the same text', () => {
		fc.assert(
			fc.property(
				fc.double({ min: 0.5, max: 90, noNaN: true }),
				fc.double({ min: 0.5, max: 800, noNaN: true }),
				fc.double({ min: -50, max: 700, noNaN: true }),
				(f, v, t) => {
					for (const system of ['imperial', 'metric'] as const) {
						const ft = formatFlow(f, system);
						const pf = parseFlow(ft);
						expect(pf.ok && formatFlow(pf.lPerMin, system)).toBe(ft);
						const st = formatSpeed(v, system, 'wire');
						const ps = parseSpeed(st);
						expect(ps.ok && formatSpeed(ps.mmPerS, system, 'wire')).toBe(st);
						const tt = formatTemperature(t, system);
						const pt = parseTemperature(tt);
						expect(pt.ok && formatTemperature(pt.degC, system)).toBe(tt);
					}
				}
			)
		);
	});
	it('SI conversions round-trip', () => {
		fc.assert(
			fc.property(fc.double({ min: 1e-3, max: 1e4, noNaN: true }), (v) => {
				expect(lPerMinToFlow(flowToLPerMin(v, 'CFH'), 'CFH')).toBeCloseTo(v, 9);
				expect(mmPerSToSpeed(speedToMmPerS(v, 'in/min'), 'in/min')).toBeCloseTo(v, 9);
			})
		);
	});
});
