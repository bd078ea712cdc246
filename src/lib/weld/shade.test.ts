import { describe, expect, it } from 'vitest';
import { checkLensShade, lensShade } from './shade';
import type { Process } from './settings';

// OSHA 29 CFR 1910.133(a)(5) minimum protective shade; ANSI Z49.1 / AWS F2.2 suggested shade.
// At a shared edge (e.g. 160 A, printed in both "60-160" and "160-250") the darker row is used.
const cases: [Process, number, number, number | null][] = [
	// GMAW and FCAW: <60: 7/-, 60-160: 10/11, 160-250: 10/12, 250-500: 10/14
	['GMAW', 0, 7, null],
	['GMAW', 59.9, 7, null],
	['GMAW', 60, 10, 11],
	['GMAW', 159.9, 10, 11],
	['GMAW', 160, 10, 12],
	['GMAW', 249.9, 10, 12],
	['GMAW', 250, 10, 14],
	['GMAW', 499.9, 10, 14],
	['GMAW', 500, 10, 14], // the top edge: OSHA prints "250-500"
	['FCAW', 59, 7, null],
	['FCAW', 200, 10, 12],
	// GTAW: <50: 8/10, 50-150: 8/12, 150-500: 10/14
	['GTAW', 10, 8, 10],
	['GTAW', 49.9, 8, 10],
	['GTAW', 50, 8, 12],
	['GTAW', 125, 8, 12],
	['GTAW', 149.9, 8, 12],
	['GTAW', 150, 10, 14],
	['GTAW', 499.9, 10, 14],
	['GTAW', 500, 10, 14], // the top edge: OSHA prints "150-500"
	// SMAW: <60: 7/-, 60-160: 8/10, 160-250: 10/12, 250-550: 11/14
	['SMAW', 59.9, 7, null],
	['SMAW', 60, 8, 10],
	['SMAW', 159.9, 8, 10],
	['SMAW', 160, 10, 12],
	['SMAW', 249.9, 10, 12],
	['SMAW', 250, 11, 14],
	['SMAW', 549.9, 11, 14],
	['SMAW', 550, 11, 14] // the top edge: OSHA prints "250-550"
];

describe('lens shade by process and amps, at and across every band edge', () => {
	it.each(cases)('%s at %d A -> minimum %d, suggested %s', (process, amps, minimum, suggested) => {
		const s = lensShade(process, amps);
		expect(s?.minimum).toBe(minimum); // OSHA 29 CFR 1910.133(a)(5)
		expect(s?.suggested).toBe(suggested); // ANSI Z49.1 / AWS F2.2
		expect(s?.aboveTable).toBe(false);
	});
	it('past the end of the table keeps the last row and says so', () => {
		// OSHA 29 CFR 1910.133(a)(5): the last bands end at 500 A (GTAW, GMAW) and 550 A (SMAW)
		expect(lensShade('GTAW', 500.1)).toMatchObject({ minimum: 10, aboveTable: true });
		expect(lensShade('GTAW', 501)).toMatchObject({ minimum: 10, aboveTable: true });
		expect(lensShade('GTAW', 550)).toMatchObject({ minimum: 10, aboveTable: true });
		expect(lensShade('GMAW', 501)).toMatchObject({ minimum: 10, aboveTable: true });
		expect(lensShade('GMAW', 650)).toMatchObject({ minimum: 10, aboveTable: true });
		expect(lensShade('SMAW', 551)).toMatchObject({ minimum: 11, aboveTable: true });
	});
	it('the check at the top edge is ok, and a caution past it', () => {
		const at = (amps: number) =>
			checkLensShade({ s: { process: 'GTAW', amps, lensShade: 12 }, system: 'imperial' });
		expect(at(500)?.status).toBe('ok'); // OSHA 29 CFR 1910.133(a)(5): "150-500" includes 500 A
		expect(at(501)?.status).toBe('caution'); // OSHA 29 CFR 1910.133(a)(5): past the table
		expect(at(501)?.message).toContain('past the end of the OSHA table');
	});
	it('no answer for negative or non-finite amps', () => {
		expect(lensShade('GTAW', -1)).toBeNull();
		expect(lensShade('GTAW', NaN)).toBeNull();
	});
});

describe('checking the shade in use', () => {
	const ctx = (amps: number, lensShade: number) => ({
		s: { process: 'GTAW' as const, amps, lensShade },
		system: 'imperial' as const
	});
	it('below the OSHA minimum is outside', () => {
		const f = checkLensShade(ctx(160, 9));
		expect(f).toMatchObject({
			status: 'outside',
			expected: { min: 10, unit: 'shade' },
			field: 'lensShade'
		});
		expect(f?.source.kind).toBe('published');
	});
	it('at or above the minimum is ok and gives the start-dark advice', () => {
		const f = checkLensShade(ctx(125, 8));
		expect(f?.status).toBe('ok');
		expect(f?.message).toContain('never below the minimum');
		expect(f?.message).toContain('suggests 12');
	});
	it('left out without a shade given', () => {
		expect(checkLensShade({ s: { process: 'GTAW', amps: 100 }, system: 'imperial' })).toBeNull();
	});
});
