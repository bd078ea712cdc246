import { describe, expect, it } from 'vitest';
import {
	ampsForWfs,
	checkAmpsVsFiller,
	checkAmpsVsThickness,
	checkWfsVsAmps,
	fillerAmpBand,
	thicknessAmpBand,
	wfsForAmps,
	wfsPerAmp
} from './amperage';
import { inToMm, mmPerSToSpeed, speedToMmPerS } from './units';

describe('amps for thickness', () => {
	it('GTAW carbon steel: about 1 A per 0.001 in, band ±25 %', () => {
		// common practice, no source: 1/8 in -> 125 A, band 93.75-156.25 rounded
		expect(thicknessAmpBand('GTAW', inToMm(1 / 8))?.band).toEqual({ min: 94, max: 156 }); // common practice, no source
		// common practice, no source: 1/16 in -> 62.5 A
		expect(thicknessAmpBand('GTAW', inToMm(1 / 16))?.band).toEqual({ min: 47, max: 78 }); // common practice, no source
		expect(thicknessAmpBand('GTAW', inToMm(1 / 8))?.source.kind).toBe('common practice'); // common practice, no source
	});
	it('stainless about 10 % lower, aluminium (AC) about 25 % higher', () => {
		// common practice, no source: 112.5 A centre for stainless, 156.25 A for aluminium
		expect(thicknessAmpBand('GTAW', inToMm(1 / 8), 'stainless')?.band).toEqual({
			min: 84,
			max: 141
		});
		expect(thicknessAmpBand('GTAW', inToMm(1 / 8), 'aluminium')?.band).toEqual({
			min: 117,
			max: 195
		});
	});
	it('the GTAW rule stops at 1/4 in (multi-pass)', () => {
		expect(thicknessAmpBand('GTAW', inToMm(1 / 4))).not.toBeNull(); // common practice, no source
		expect(thicknessAmpBand('GTAW', inToMm(5 / 16))).toBeNull(); // common practice, no source
	});
	it('GMAW by thickness band', () => {
		// common practice, compiled band table
		expect(thicknessAmpBand('GMAW', inToMm(3 / 16))?.band).toEqual({ min: 140, max: 220 }); // common practice, compiled bands
		expect(thicknessAmpBand('GMAW', inToMm(0.0598))?.band).toEqual({ min: 70, max: 120 }); // common practice, compiled bands
		expect(thicknessAmpBand('GMAW', inToMm(3 / 16), 'stainless')?.band).toEqual({
			min: 126,
			max: 198
		});
		expect(thicknessAmpBand('GMAW', inToMm(3 / 16), 'aluminium')).toBeNull(); // common practice, compiled bands
		expect(thicknessAmpBand('GMAW', inToMm(1))).toBeNull(); // common practice, compiled bands
	});
	it('no band for SMAW/FCAW or unusable thickness', () => {
		expect(thicknessAmpBand('SMAW', 6)).toBeNull();
		expect(thicknessAmpBand('GTAW', -1)).toBeNull(); // common practice, no source
		expect(thicknessAmpBand('GTAW', NaN)).toBeNull(); // common practice, no source
	});
	it('the finding reads like the contract example', () => {
		const f = checkAmpsVsThickness({
			s: { process: 'GTAW', amps: 125, thicknessMm: inToMm(0.125) },
			system: 'imperial',
			family: 'carbon-steel'
		});
		expect(f).toEqual({
			check: 'amps-vs-thickness',
			status: 'ok',
			message: '125 A is within the usual band for 1/8 in carbon steel (94–156 A).',
			value: 125,
			expected: { min: 94, max: 156, unit: 'A' },
			source: { label: expect.any(String), kind: 'common practice' },
			field: 'amps'
		});
	});
	it('a little outside is a caution, far outside is outside', () => {
		const at = (amps: number) =>
			checkAmpsVsThickness({
				s: { process: 'GTAW', amps, thicknessMm: inToMm(0.125) },
				system: 'metric'
			})?.status;
		expect(at(160)).toBe('caution'); // within 10 % above 156
		expect(at(200)).toBe('outside');
		expect(at(88)).toBe('caution');
		expect(at(60)).toBe('outside');
	});
});

describe('amps for wire and rod size', () => {
	it('GMAW solid wire by transfer (equipment data, common practice)', () => {
		expect(fillerAmpBand('GMAW', inToMm(0.03), 'short-circuit')?.band).toEqual({
			min: 70,
			max: 130
		});
		expect(fillerAmpBand('GMAW', inToMm(0.03), 'spray')?.band).toEqual({ min: 150, max: 265 }); // common practice (equipment data)
		expect(fillerAmpBand('GMAW', inToMm(0.035), 'short-circuit')?.band).toEqual({
			min: 80,
			max: 190
		});
		expect(fillerAmpBand('GMAW', inToMm(0.035), 'spray')?.band).toEqual({ min: 175, max: 290 }); // common practice (equipment data)
		expect(fillerAmpBand('GMAW', inToMm(0.045), 'short-circuit')?.band).toEqual({
			min: 100,
			max: 225
		});
		expect(fillerAmpBand('GMAW', inToMm(0.045), 'pulsed-spray')?.band).toEqual({
			min: 200,
			max: 315
		});
		expect(fillerAmpBand('GMAW', inToMm(0.035))?.band).toEqual({ min: 80, max: 290 }); // no mode: both
		expect(fillerAmpBand('GMAW', 0.9, 'short-circuit')?.band).toEqual({ min: 80, max: 190 }); // 0.9 mm = 0.035 in
		expect(fillerAmpBand('GMAW', inToMm(0.024), 'spray')).toBeNull(); // common practice (equipment data)
	});
	it('GTAW rod (common practice)', () => {
		expect(fillerAmpBand('GTAW', inToMm(1 / 16))?.band).toEqual({ min: 20, max: 90 }); // common practice, no source
		expect(fillerAmpBand('GTAW', 2.4)?.band).toEqual({ min: 65, max: 115 }); // common practice, no source
		expect(fillerAmpBand('GTAW', 3.2)?.band).toEqual({ min: 100, max: 165 }); // common practice, no source
		expect(fillerAmpBand('GTAW', 5)).toBeNull(); // common practice, no source
	});
	it('SMAW E7018-type electrode bands only for F-4 electrodes', () => {
		// Machinery's Handbook, 31st ed., Table 14, E7018 column (online.flippingbook.com/view/954046886/114)
		expect(fillerAmpBand('SMAW', inToMm(3 / 32))?.band).toEqual({ min: 70, max: 105 }); // Table 14
		expect(fillerAmpBand('SMAW', inToMm(1 / 8))?.band).toEqual({ min: 110, max: 160 }); // Table 14
		expect(fillerAmpBand('SMAW', inToMm(5 / 32))?.band).toEqual({ min: 150, max: 215 }); // Table 14
		expect(fillerAmpBand('SMAW', inToMm(3 / 16))?.band).toEqual({ min: 180, max: 275 }); // Table 14
		expect(fillerAmpBand('SMAW', inToMm(1 / 8))?.source.kind).toBe('common practice');
		const e6010 = { classification: 'E6010', fNumber: 3 } as never;
		expect(
			checkAmpsVsFiller({
				s: { process: 'SMAW', amps: 100, filler: { diameterMm: 3.2 } },
				system: 'imperial',
				filler: e6010
			})
		).toBeNull();
	});
	it('finding sits on filler.diameter', () => {
		const f = checkAmpsVsFiller({
			s: {
				process: 'GMAW',
				amps: 150,
				transfer: 'short-circuit',
				filler: { diameterMm: inToMm(0.035) }
			},
			system: 'imperial'
		});
		expect(f).toMatchObject({
			status: 'ok',
			field: 'filler.diameter',
			expected: { min: 80, max: 190, unit: 'A' }
		});
		expect(f?.message).toBe(
			'150 A is within the usual band for 0.035 in wire, short-circuit (80–190 A).'
		);
	});
});

describe('wire feed speed and amps', () => {
	it('in/min per amp by wire size (common practice)', () => {
		expect(wfsPerAmp(inToMm(0.023))?.inPerMinPerAmp).toBe(3.5); // common practice (machine manuals)
		expect(wfsPerAmp(inToMm(0.024))?.inPerMinPerAmp).toBe(3.5); // common practice (machine manuals)
		expect(wfsPerAmp(inToMm(0.03))?.inPerMinPerAmp).toBe(2.0); // common practice (machine manuals)
		expect(wfsPerAmp(inToMm(0.035))?.inPerMinPerAmp).toBe(1.6); // common practice (machine manuals)
		expect(wfsPerAmp(inToMm(0.045))?.inPerMinPerAmp).toBe(1.0); // common practice (machine manuals)
		expect(wfsPerAmp(2)).toBeNull();
	});
	it('converts both ways', () => {
		// 0.035 in at 125 A -> 200 in/min; 0.030 in at 62.5 A -> 125 in/min
		expect(mmPerSToSpeed(wfsForAmps(inToMm(0.035), 125) ?? NaN, 'in/min')).toBeCloseTo(200, 9);
		expect(mmPerSToSpeed(wfsForAmps(inToMm(0.03), 62.5) ?? NaN, 'in/min')).toBeCloseTo(125, 9);
		expect(ampsForWfs(inToMm(0.045), speedToMmPerS(300, 'in/min'))).toBeCloseTo(300, 9);
		expect(ampsForWfs(inToMm(0.045), -5)).toBeNull();
	});
	it('flags amps far from what the wire feed speed implies (caution only)', () => {
		const s = {
			process: 'GMAW' as const,
			wireFeedMmPerS: speedToMmPerS(200, 'in/min'),
			filler: { diameterMm: inToMm(0.035) }
		};
		expect(checkWfsVsAmps({ s: { ...s, amps: 125 }, system: 'imperial' })?.status).toBe('ok');
		const off = checkWfsVsAmps({ s: { ...s, amps: 200 }, system: 'imperial' });
		expect(off).toMatchObject({
			status: 'caution',
			field: 'wireFeed',
			expected: { min: 100, max: 150, unit: 'A' }
		});
		expect(
			checkWfsVsAmps({ s: { ...s, process: 'GTAW', amps: 200 }, system: 'imperial' })
		).toBeNull();
	});
});
