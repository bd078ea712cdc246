import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	checkAmpsVsTungsten,
	checkTungstenVsCurrent,
	parseTungsten,
	tungstenAmpRanges
} from './tungsten';
import { inToMm } from './units';

const t = (x: string) => {
	const r = parseTungsten(x); // AWS A5.12
	if (!r.ok) throw new Error(r.message);
	return r.tungsten;
};

describe('AWS A5.12 classifications', () => {
	it('reads AWS and ISO 6848 names and plain words', () => {
		expect(t('EWLa-1.5').classification).toBe('EWLa-1.5'); // AWS A5.12
		expect(t('ewla1.5').classification).toBe('EWLa-1.5'); // AWS A5.12
		expect(t('WL15').classification).toBe('EWLa-1.5'); // ISO 6848
		expect(t('EWCe-2').classification).toBe('EWCe-2'); // AWS A5.12
		expect(t('WC20').classification).toBe('EWCe-2'); // AWS A5.12
		expect(t('EWTh-2')).toMatchObject({ radioactive: true, colour: 'red' }); // AWS A5.12
		expect(t('EWP')).toMatchObject({ group: 'pure', colour: 'green' }); // AWS A5.12
		expect(t('EWZr-1').group).toBe('zirconiated'); // AWS A5.12
		expect(t('2% ceriated').classification).toBe('EWCe-2'); // AWS A5.12
	});
	it('asks which lanthanated, and names what it knows otherwise', () => {
		const r = parseTungsten('lanthanated'); // AWS A5.12
		expect(r.ok).toBe(false);
		const u = parseTungsten('EWX-9'); // AWS A5.12
		expect(u.ok).toBe(false);
		if (!u.ok) expect(u.message).toContain('EWLa-1.5');
	});
});

describe('current ranges, kept per chart (they disagree)', () => {
	const a = (cls: string, d: number, c: 'DCEN' | 'AC', chart: 'chart-a' | 'chart-b') =>
		tungstenAmpRanges(cls, d, c).find((r) => r.chart === chart)?.amps ?? null;
	it('chart A, 2 % Ce / 1.5 % La / 2 % Th, DCEN argon (common practice)', () => {
		expect(a('EWCe-2', 1.0, 'DCEN', 'chart-a')).toEqual({ min: 25, max: 85 }); // common practice (chart A)
		expect(a('EWLa-1.5', inToMm(1 / 16), 'DCEN', 'chart-a')).toEqual({ min: 50, max: 160 }); // common practice (chart A)
		expect(a('EWTh-2', inToMm(3 / 32), 'DCEN', 'chart-a')).toEqual({ min: 135, max: 235 }); // common practice (chart A)
		expect(a('EWLa-1.5', 3.2, 'DCEN', 'chart-a')).toEqual({ min: 250, max: 400 }); // common practice (chart A)
	});
	it('chart A, AC (common practice)', () => {
		expect(a('EWLa-1.5', 1.0, 'AC', 'chart-a')).toEqual({ min: 20, max: 80 }); // common practice (chart A)
		expect(a('EWLa-1.5', 1.6, 'AC', 'chart-a')).toEqual({ min: 50, max: 150 }); // common practice (chart A)
		expect(a('EWLa-1.5', 2.4, 'AC', 'chart-a')).toEqual({ min: 130, max: 250 }); // common practice (chart A)
		expect(a('EWLa-1.5', 3.2, 'AC', 'chart-a')).toEqual({ min: 225, max: 360 }); // common practice (chart A)
		expect(a('EWP', 2.4, 'AC', 'chart-a')).toEqual({ min: 100, max: 160 }); // common practice (chart A)
	});
	it('chart B disagrees at 3/32 in DCEN (common practice)', () => {
		expect(a('EWLa-1.5', 2.4, 'DCEN', 'chart-b')).toEqual({ min: 150, max: 250 }); // common practice (chart B)
	});
	it('pure tungsten on DC has no range; odd sizes have none', () => {
		expect(tungstenAmpRanges('EWP', 2.4, 'DCEN').every((r) => r.amps === null)).toBe(true);
		expect(tungstenAmpRanges('EWLa-1.5', 2.0, 'DCEN').every((r) => r.amps === null)).toBe(true);
		expect(tungstenAmpRanges('EWG', 2.4, 'DCEN')).toEqual([]);
	});
});

describe('findings', () => {
	const ctx = (amps: number, cls: string, d: number, currentType: 'DCEN' | 'AC' | 'DCEP') => ({
		s: {
			process: 'GTAW' as const,
			amps,
			currentType,
			tungsten: { classification: cls, diameterMm: d }
		},
		system: 'imperial' as const,
		tungsten: t(cls)
	});
	it('inside both charts ok, inside one caution, above outside, below caution', () => {
		expect(checkAmpsVsTungsten(ctx(200, 'EWLa-1.5', 2.4, 'DCEN'))?.status).toBe('ok');
		expect(checkAmpsVsTungsten(ctx(140, 'EWLa-1.5', 2.4, 'DCEN'))?.status).toBe('caution');
		expect(checkAmpsVsTungsten(ctx(300, 'EWLa-1.5', 2.4, 'DCEN'))?.status).toBe('outside');
		const low = checkAmpsVsTungsten(ctx(125, 'EWLa-1.5', 2.4, 'DCEN'));
		expect(low).toMatchObject({
			status: 'caution',
			field: 'tungsten.diameter',
			expected: { min: 135, max: 235, unit: 'A' }
		});
	});
	it('pure and zirconiated tungsten are for AC; thoriated gets the dust caution', () => {
		expect(checkTungstenVsCurrent(ctx(100, 'EWP', 2.4, 'DCEN'))?.status).toBe('outside');
		expect(checkTungstenVsCurrent(ctx(100, 'EWP', 2.4, 'AC'))?.status).toBe('ok');
		expect(checkTungstenVsCurrent(ctx(100, 'EWTh-2', 2.4, 'DCEN'))?.message).toContain(
			'radioactive'
		);
	});
});

it('never throws (fast-check)', () => {
	fc.assert(
		fc.property(
			fc.anything(),
			fc.double(),
			fc.constantFrom('DCEN', 'AC', 'DCEP' as const),
			(x, d, c) => {
				parseTungsten(x); // AWS A5.12
				tungstenAmpRanges(x as string, d, c as 'DCEN');
			}
		)
	);
});
