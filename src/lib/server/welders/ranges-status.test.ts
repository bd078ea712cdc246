import { describe, expect, it } from 'vitest';
import { qualifiedRanges, type QualificationFacts } from './ranges';
import { qualificationStatus } from './status';
import { fNumberCovers, positionsNeeded } from './procedure-match';

const IN = 25.4;
const facts = (over: Partial<QualificationFacts> = {}): QualificationFacts => ({
	code: 'ASME IX',
	testPositions: '3G',
	couponType: 'plate',
	couponDiameterMm: null,
	depositThicknessMm: 0.375 * IN,
	depositLayers: null,
	lengthUnit: 'in',
	fNumber: 6,
	...over
});
const pos = (tests: string, couponType: 'plate' | 'pipe' = 'plate') => {
	const r = qualifiedRanges(facts({ testPositions: tests, couponType }));
	return { groove: r.groove, groovePipe: r.groovePipe, fillet: r.fillet };
};
const ALL = ['F', 'H', 'V', 'O'];

describe('positions qualified, ASME IX QW-461.9 row by row', () => {
	it.each([
		// [test, form, groove (plate and pipe > 24 in), groove pipe <= 24 in, fillet]
		['1G', 'plate', ['F'], ['F'], ['F']], // ASME IX QW-461.9
		['2G', 'plate', ['F', 'H'], ['F', 'H'], ['F', 'H']], // ASME IX QW-461.9
		['3G', 'plate', ['F', 'V'], ['F'], ['F', 'H', 'V']], // ASME IX QW-461.9
		['4G', 'plate', ['F', 'O'], ['F'], ['F', 'H', 'O']], // ASME IX QW-461.9
		['1F', 'plate', [], [], ['F']], // ASME IX QW-461.9
		['2F', 'plate', [], [], ['F', 'H']], // ASME IX QW-461.9
		['3F', 'plate', [], [], ['F', 'H', 'V']], // ASME IX QW-461.9
		['4F', 'plate', [], [], ['F', 'H', 'O']], // ASME IX QW-461.9
		['5G', 'pipe', ['F', 'V', 'O'], ['F', 'V', 'O'], ALL], // ASME IX QW-461.9
		['6G', 'pipe', ALL, ALL, ALL], // ASME IX QW-461.9
		['2FR', 'pipe', [], [], ['F', 'H']], // ASME IX QW-461.9
		['5F', 'pipe', [], [], ALL] // ASME IX QW-461.9
	] as const)('%s %s', (test, form, groove, groovePipe, fillet) => {
		expect(pos(test, form)).toEqual({ groove, groovePipe, fillet });
	});
	it('3G + 4G plate qualifies groove F, V, O and fillet in all positions', () => {
		expect(pos('3G,4G')).toEqual({ groove: ['F', 'V', 'O'], groovePipe: ['F'], fillet: ALL }); // ASME IX QW-461.9
	});
	it('names its source', () => {
		const r = qualifiedRanges(facts());
		expect(r.positionsSource).toEqual({
			label: 'ASME BPVC Section IX QW-461.9',
			kind: 'published'
		});
	});
});

describe('deposited weld metal, ASME IX QW-452.1(b)', () => {
	it('2t for any coupon', () => {
		const r = qualifiedRanges(facts({ depositThicknessMm: 0.25 * IN }));
		expect(r.depositMaxMm! / IN).toBeCloseTo(0.5, 9); // ASME IX QW-452.1(b): 2t
		expect(r.depositSource.label).toBe('ASME BPVC Section IX QW-452.1(b)');
	});
	it('1/2 in and over with at least 3 layers: maximum to be welded', () => {
		expect(
			qualifiedRanges(facts({ depositThicknessMm: 0.5 * IN, depositLayers: 3 })).depositMaxMm
		).toBeNull(); // ASME IX QW-452.1(b)
		expect(
			qualifiedRanges(facts({ depositThicknessMm: 0.5 * IN, depositLayers: 2 })).depositMaxMm! / IN
		).toBeCloseTo(1, 9); // ASME IX QW-452.1(b): 2 layers only, so 2t
	});
	it('metric entry uses the code’s metric edge (13 mm)', () => {
		const r = qualifiedRanges(
			facts({ lengthUnit: 'mm', depositThicknessMm: 13, depositLayers: 3 })
		);
		expect(r.depositMaxMm).toBeNull(); // ASME IX QW-452.1(b): 13 mm and over
		expect(qualifiedRanges(facts({ lengthUnit: 'mm', depositThicknessMm: 6 })).depositMaxMm).toBe(
			12
		); // 2t
	});
});

describe('pipe diameter, ASME IX QW-452.3 and the QW-461.9 plate rule', () => {
	it.each([
		[0.84, true, 0.84], // ASME IX QW-452.3: under 1 in OD, the size welded
		[2.375, false, 1], // ASME IX QW-452.3: 1 to 2-7/8 in OD, 1 in and over
		[6.625, false, 2.875] // ASME IX QW-452.3: over 2-7/8 in OD, 2-7/8 in and over
	])('%s in OD pipe', (od, sizeWelded, min) => {
		const r = qualifiedRanges(
			facts({ couponType: 'pipe', testPositions: '6G', couponDiameterMm: od * IN })
		);
		expect(r.minDiameterIsSizeWelded).toBe(sizeWelded);
		expect(r.minDiameterMm! / IN).toBeCloseTo(min, 9);
	});
	it('a plate test qualifies pipe from 2-7/8 in (73 mm) OD', () => {
		expect(qualifiedRanges(facts()).minDiameterMm! / IN).toBeCloseTo(2.875, 9); // ASME IX QW-461.9 plate rows
		expect(qualifiedRanges(facts({ lengthUnit: 'mm' })).minDiameterMm).toBe(73); // ASME IX QW-461.9 plate rows
	});
	it('says when the code tested to is not ASME IX', () => {
		expect(qualifiedRanges(facts({ code: 'AWS D1.1' })).codeNote).toMatch(/AWS D1\.1 sets its own/);
	});
});

describe('status: six calendar months after the last use, ASME IX QW-322.1 / AWS D1.1', () => {
	const status = (testDate: string, uses: string[], today: string, code = 'ASME IX') =>
		qualificationStatus({ code, testDate, uses, confirmations: [] }, today);
	it.each([
		['2025-01-15', '2025-07-15'], // ASME IX QW-322.1: six months
		['2025-08-31', '2026-02-28'], // month end into a 28-day February (rule: clamp to the month's end)
		['2023-08-31', '2024-02-29'], // leap year 2024
		['2025-03-31', '2025-09-30'], // into a 30-day month
		['2025-12-31', '2026-06-30'], // across the year end
		['2024-02-29', '2024-08-29'], // from a leap day
		['1999-08-31', '2000-02-29'] // 2000 is a leap year (divisible by 400)
	])('test %s lapses on %s', (testDate, lapse) => {
		expect(status(testDate, [], testDate).lapsesOn).toBe(lapse);
	});
	it('current the day before, lapsed on the lapse date', () => {
		expect(status('2025-01-15', [], '2025-07-14')).toMatchObject({ state: 'current', daysLeft: 1 });
		expect(status('2025-01-15', [], '2025-07-15')).toMatchObject({ state: 'lapsed', daysLeft: 0 });
	});
	it('a use moves the lapse date; a later test date wins over older uses', () => {
		expect(status('2025-01-15', ['2025-05-31'], '2025-06-01')).toMatchObject({
			lastActivity: '2025-05-31',
			lapsesOn: '2025-11-30', // Nov has 30 days: clamped
			daysLeft: 182,
			basis: 'use'
		});
		expect(status('2025-03-01', ['2025-02-01'], '2025-03-02').lastActivity).toBe('2025-03-01');
	});
	it('days left across the end of February in a leap year', () => {
		// from 2024-02-27 to 2024-03-02 is 4 days: Feb 2024 has 29 days
		expect(status('2023-09-02', [], '2024-02-27')).toMatchObject({
			lapsesOn: '2024-03-02',
			daysLeft: 4
		});
		expect(status('2022-09-02', [], '2023-02-27')).toMatchObject({
			lapsesOn: '2023-03-02',
			daysLeft: 3
		});
	});
	it('ISO 9606-1 counts from the confirmation, not from uses', () => {
		const r = qualificationStatus(
			{
				code: 'ISO 9606-1',
				testDate: '2025-01-10',
				uses: ['2025-05-01'],
				confirmations: ['2025-03-20']
			},
			'2025-06-01'
		);
		expect(r).toMatchObject({ basis: 'confirmation', lapsesOn: '2025-09-20' }); // ISO 9606-1 9.2: six months
	});
	it('withdrawn wins over the dates', () => {
		expect(
			qualificationStatus(
				{
					code: 'ASME IX',
					testDate: '2025-01-10',
					uses: [],
					confirmations: [],
					withdrawnAt: new Date()
				},
				'2025-02-01'
			).state
		).toBe('withdrawn');
	});
});

describe('procedure match helpers', () => {
	it('WPS positions to weld positions', () => {
		expect(positionsNeeded(['2F', '3G'])).toEqual(['H', 'V']); // QW-461.1 to QW-461.4 names
		expect(positionsNeeded(['6G'])).toEqual(ALL);
		expect(positionsNeeded(['f', 'h'])).toEqual(['F', 'H']);
	});
	it('F-Numbers: same number, or SMAW F-4 down to F-1', () => {
		expect(fNumberCovers('GTAW', 6, 6)).toBe(true); // ASME IX QW-433 (public welder-variables summary)
		expect(fNumberCovers('GMAW', 6, 5)).toBe(false); // ASME IX QW-433 (public welder-variables summary)
		expect(fNumberCovers('SMAW', 4, 3)).toBe(true); // ASME IX QW-433 (public welder-variables summary)
		expect(fNumberCovers('SMAW', 3, 4)).toBe(false); // ASME IX QW-433 (public welder-variables summary)
	});
});
