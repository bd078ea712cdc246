import { describe, expect, it } from 'vitest';
import { parseFiller } from './filler';
import { checkCurrentType } from './polarity';
import type { WeldSettings } from './settings';

const status = (
	process: WeldSettings['process'],
	currentType: WeldSettings['currentType'],
	family?: 'carbon-steel' | 'aluminium',
	filler?: string
) => {
	const f = filler ? parseFiller(filler) : undefined;
	return checkCurrentType({
		s: { process, currentType },
		system: 'imperial',
		family,
		filler: f?.ok ? f.filler : undefined
	})?.status;
};

describe('current type and polarity (common practice unless the classification says)', () => {
	it('GTAW', () => {
		expect(status('GTAW', 'DCEN', 'carbon-steel')).toBe('ok'); // common practice
		expect(status('GTAW', 'AC', 'aluminium')).toBe('ok'); // common practice
		expect(status('GTAW', 'DCEN', 'aluminium')).toBe('caution'); // common practice
		expect(status('GTAW', 'AC', 'carbon-steel')).toBe('caution'); // common practice
		expect(status('GTAW', 'DCEP')).toBe('caution'); // common practice
	});
	it('GMAW runs DCEP', () => {
		expect(status('GMAW', 'DCEP')).toBe('ok'); // common practice
		expect(status('GMAW', 'DCEN')).toBe('outside'); // common practice
		expect(status('GMAW', 'AC')).toBe('outside'); // common practice
	});
	it('FCAW and SMAW follow the classification', () => {
		expect(status('FCAW', 'DCEP', 'carbon-steel', 'E71T-1C')).toBe('ok'); // common practice
		expect(status('FCAW', 'DCEP', 'carbon-steel', 'E71T-11')).toBe('outside'); // self-shielded -11 is DCEN
		expect(status('SMAW', 'AC', 'carbon-steel', 'E6010')).toBe('outside'); // E6010 is DCEP only (AWS A5.1 EXX10 = DC+, as reprinted at tokoc.com and in an equipment manual's electrode chart)
		expect(status('SMAW', 'AC', 'carbon-steel', 'E7018')).toBe('ok'); // common practice
		expect(status('SMAW', 'AC')).toBeUndefined(); // no classification: left out
	});
});
