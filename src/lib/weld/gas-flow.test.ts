import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkGasFlow, checkGasForProcess, gasFlowRange, parseGas, type GasMix } from './gas-flow';
import { parseFiller } from './filler';
import { flowToLPerMin } from './units';
import type { WeldSettings } from './settings';

const g = (x: string): GasMix => {
	const r = parseGas(x);
	if (!r.ok) throw new Error(r.message);
	return r.gas;
};

describe('common shielding gas mixes', () => {
	it('reads the names shops use', () => {
		expect(g('argon').id).toBe('argon');
		expect(g('100% Ar').id).toBe('argon');
		expect(g('75/25').id).toBe('ar-co2-75-25');
		expect(g('C25').id).toBe('ar-co2-75-25');
		expect(g('90/10').id).toBe('ar-co2-90-10');
		expect(g('98/2 Ar/O2').id).toBe('ar-o2-98-2');
		expect(g('100% CO2').id).toBe('co2');
		expect(g('75 He / 25 Ar').id).toBe('ar-he-25-75');
		expect(g('tri-mix')).toMatchObject({ he: 90, ar: 7.5, co2: 2.5 });
		for (const m of ['argon', '75/25', '90/10', '98/2', 'co2', 'helium'])
			expect(g(m).source.kind).toBe('common practice');
	});
	it('says which gases it knows when it cannot read one', () => {
		const r = parseGas('air');
		expect(r.ok).toBe(false);
		if (!r.ok) expect(r.message).toContain('Argon');
	});
});

describe('flow ranges', () => {
	it('GTAW argon 11-35 CFH, GMAW 25-35 CFH (common practice)', () => {
		expect(gasFlowRange('GTAW', g('argon'))?.cfh).toEqual({ min: 11, max: 35 }); // common practice, no source
		expect(gasFlowRange('GMAW', g('75/25'))?.cfh).toEqual({ min: 25, max: 35 }); // common practice (textbook table)
		expect(gasFlowRange('GTAW', g('helium'))?.source.kind).toBe('from memory');
		// Modern Welding (Goodheart-Willcox, 2020) p. 214, Figure 8-35: FCAW-G flows as GMAW's,
		// carbon and low-alloy steel 25 (1/16 in) to 50 (3/4 in) ft3/h
		expect(gasFlowRange('FCAW', g('co2'))?.cfh).toEqual({ min: 25, max: 50 });
		expect(gasFlowRange('FCAW', g('co2'))?.source.kind).toBe('common practice');
		expect(gasFlowRange('SMAW')).toBeNull();
	});
	const flow = (
		process: WeldSettings['process'],
		gas: string,
		cfh: number,
		system: 'imperial' | 'metric' = 'imperial'
	) =>
		checkGasFlow({
			s: { process, gas: { name: gas, flowLPerMin: flowToLPerMin(cfh, 'CFH') } },
			system,
			gas: g(gas)
		});
	it('inside is ok, outside is only ever a caution', () => {
		expect(flow('GTAW', 'argon', 20)).toMatchObject({
			status: 'ok',
			value: 20,
			expected: { min: 11, max: 35, unit: 'CFH' },
			field: 'gas.flow'
		});
		expect(flow('GTAW', 'argon', 8)?.status).toBe('caution'); // common practice
		expect(flow('GTAW', 'argon', 80)?.status).toBe('caution'); // common practice
		expect(flow('GMAW', '75/25', 15)?.message).toContain('porosity'); // common practice
	});
	it('metric users get L/min', () => {
		const f = flow('GTAW', 'argon', 20, 'metric');
		expect(f?.expected).toEqual({ min: 5.2, max: 16.5, unit: 'L/min' });
		expect(f?.value).toBe(9.4);
	});
	it('left out for self-shielded wire', () => {
		const filler = parseFiller('E71T-11');
		expect(filler.ok).toBe(true);
		if (filler.ok)
			expect(
				checkGasFlow({
					s: { process: 'FCAW', gas: { flowLPerMin: 10 } },
					system: 'imperial',
					filler: filler.filler
				})
			).toBeNull();
	});
});

describe('gas for the process', () => {
	const v = (
		s: Partial<WeldSettings> & { process: WeldSettings['process'] },
		gas: string,
		family?: 'carbon-steel' | 'stainless' | 'aluminium',
		filler?: string
	) => {
		const f = filler ? parseFiller(filler) : undefined;
		return checkGasForProcess({
			s,
			system: 'imperial',
			gas: g(gas),
			family,
			filler: f?.ok ? f.filler : undefined
		})?.status;
	};
	it('GTAW needs inert gas', () => {
		expect(v({ process: 'GTAW' }, 'argon')).toBe('ok'); // common practice
		expect(v({ process: 'GTAW' }, '75/25')).toBe('outside'); // common practice
	});
	it('GMAW: aluminium inert only, spray needs argon-rich, stainless and CO2, steel and pure argon', () => {
		expect(v({ process: 'GMAW' }, '75/25', 'aluminium')).toBe('outside'); // common practice
		expect(v({ process: 'GMAW' }, 'argon', 'aluminium')).toBe('ok'); // common practice
		expect(v({ process: 'GMAW', transfer: 'spray' }, 'co2', 'carbon-steel')).toBe('outside'); // common practice
		expect(v({ process: 'GMAW', transfer: 'spray' }, '90/10', 'carbon-steel')).toBe('ok'); // common practice
		expect(v({ process: 'GMAW' }, '75/25', 'stainless')).toBe('caution'); // common practice
		expect(v({ process: 'GMAW' }, 'tri-mix', 'stainless')).toBe('ok'); // common practice
		expect(v({ process: 'GMAW' }, 'argon', 'carbon-steel')).toBe('caution'); // common practice
	});
	it('FCAW follows the C / M letter of the classification', () => {
		expect(v({ process: 'FCAW' }, 'co2', 'carbon-steel', 'E71T-1C')).toBe('ok'); // common practice
		expect(v({ process: 'FCAW' }, '75/25', 'carbon-steel', 'E71T-1C')).toBe('caution'); // common practice
		expect(v({ process: 'FCAW' }, '75/25', 'carbon-steel', 'E71T-1M')).toBe('ok'); // common practice
		expect(v({ process: 'FCAW' }, 'co2', 'carbon-steel', 'E71T-11')).toBe('caution'); // common practice
	});
});

it('never throws (fast-check)', () => {
	fc.assert(fc.property(fc.anything(), (x) => void parseGas(x)));
});
