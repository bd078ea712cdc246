import { describe, expect, it } from 'vitest';
import { cautionsFor, shadeForRange } from './cautions';

describe('shadeForRange', () => {
	it('takes the darkest minimum over the range and the suggestion at its top', () => {
		// OSHA 29 CFR 1910.133(a)(5): GTAW 50–150 A minimum 8, 150–500 A minimum 10;
		// ANSI Z49.1 / AWS F2.2 suggests 12 and 14.
		expect(shadeForRange('GTAW', { min: 115, max: 135 })).toEqual({
			minimum: 8,
			suggested: 12,
			atAmps: 135
		});
		expect(shadeForRange('GTAW', { min: 120, max: 160 })).toEqual({
			minimum: 10,
			suggested: 14,
			atAmps: 160
		});
		// OSHA 29 CFR 1910.133(a)(5): GMAW 160–250 A minimum 10; ANSI Z49.1 suggests 12.
		expect(shadeForRange('GMAW', { min: null, max: 200 })).toMatchObject({
			minimum: 10,
			suggested: 12
		});
	});

	it('gives nothing when no amperage is set', () => {
		expect(shadeForRange('GTAW', { min: null, max: null })).toBeNull();
	});
});

describe('cautionsFor', () => {
	it('always lists arc, fumes, shock and fire; gas cylinders except for SMAW', () => {
		const ids = (p: Parameters<typeof cautionsFor>[0]) => cautionsFor(p).map((c) => c.id);
		expect(ids({ process: 'GMAW' })).toEqual(['arc', 'fumes', 'shock', 'fire', 'cylinders']);
		expect(ids({ process: 'SMAW' })).toEqual(['arc', 'fumes', 'shock', 'fire']);
	});

	it('adds hexavalent chromium for stainless and thoria for EWTh tungsten', () => {
		const ids = cautionsFor({ process: 'GTAW', family: 'stainless', tungsten: 'EWTh-2' }).map(
			(c) => c.id
		);
		expect(ids).toContain('chromium');
		expect(ids).toContain('thoria');
		expect(cautionsFor({ process: 'GTAW', tungsten: 'EWCe-2' }).map((c) => c.id)).not.toContain(
			'thoria'
		);
	});

	it('puts the shade in the arc caution', () => {
		const arc = cautionsFor({
			process: 'GTAW',
			shade: { minimum: 8, suggested: 12, atAmps: 135 }
		})[0];
		expect(arc?.text).toMatch(/at least 8 \(suggested 12\) up to 135 A/);
		expect(arc?.text).toMatch(/never below the minimum/);
	});
});
