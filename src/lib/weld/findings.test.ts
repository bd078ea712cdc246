import { describe, expect, it } from 'vitest';
import { ADVISORY_NOTE, bandStatus, expected, rangeText } from './findings';

describe('band status', () => {
	it('soft bands: 10 % past an edge is a caution', () => {
		expect(bandStatus(100, { min: 94, max: 156 })).toBe('ok');
		expect(bandStatus(94, { min: 94, max: 156 })).toBe('ok');
		expect(bandStatus(85, { min: 94, max: 156 })).toBe('caution');
		expect(bandStatus(84, { min: 94, max: 156 })).toBe('outside');
		expect(bandStatus(171, { min: 94, max: 156 })).toBe('caution');
		expect(bandStatus(172, { min: 94, max: 156 })).toBe('outside');
	});
	it('hard limits: margin 0', () => {
		expect(bandStatus(93.9, { min: 94 }, 0)).toBe('outside');
		expect(bandStatus(1e9, { min: 94 }, 0)).toBe('ok');
	});
});

describe('text helpers', () => {
	it('prints a shared unit once', () => {
		expect(rangeText('11 CFH', '35 CFH')).toBe('11–35 CFH');
		expect(rangeText('3/16 in', '8 in')).toBe('3/16–8 in');
		expect(rangeText('94', '156')).toBe('94–156');
		expect(rangeText('50 °F', null)).toBe('at least 50 °F');
		expect(rangeText(null, '35 CFH')).toBe('at most 35 CFH');
	});
	it('expected blocks round and omit missing ends', () => {
		expect(expected({ min: 93.75, max: 156.25 }, 'A')).toEqual({ min: 94, max: 156, unit: 'A' });
		expect(expected({ max: 5.19 }, 'L/min', 1)).toEqual({ max: 5.2, unit: 'L/min' });
	});
	it('keeps the advisory sentence for the UI', () => {
		expect(ADVISORY_NOTE).toContain('the inspector');
	});
});
