import { describe, expect, it } from 'vitest';
import { asmeToIsoSource } from '$reference/iso-6947';
import { withIso6947 } from '$lib/weld/iso-9606-ranges';
import { isoRangesFor } from './iso-ranges';
import { qualifiedRanges } from './ranges';

// An ISO 9606-1 WPQ shown in its own terms (ISO 9606-1:2012 clause 5, read from the text).
describe('ISO 9606-1 qualifications in their own terms', () => {
	const facts = {
		code: 'ISO 9606-1',
		process: 'GMAW',
		testPositions: '3G',
		couponType: 'plate' as const,
		couponDiameterMm: null,
		couponThicknessMm: 10,
		depositThicknessMm: 10,
		depositLayers: 3,
		lengthUnit: 'mm' as const,
		fNumber: 6
	};
	it('lists process, product, weld type, thickness and positions with their clauses', () => {
		const r = qualifiedRanges(facts);
		const by = Object.fromEntries((r.iso ?? []).map((i) => [i.variable, i.qualified]));
		expect(by['Process']).toBe('135 and 138'); // ISO 9606-1:2012 5.2
		expect(by['Material thickness']).toBe('3–20 mm'); // 3 to 2t, ISO 9606-1:2012 Table 6
		// PF qualifies PA, PF (ISO 9606-1:2012 Table 9); 3G uphill is PF in ISO 6947:2011 Annex B
		// Table B.1 (read in GOST R ISO 6947-2017, identical, docs.cntd.ru/document/1200144942)
		expect(by['Welding positions (ISO 6947)']).toBe('PA, PF');
		expect(r.codeNote).toContain('for comparison');
	});
	it('gives nothing in ISO terms for an ASME IX qualification', () => {
		expect(qualifiedRanges({ ...facts, code: 'ASME IX' }).iso).toBeNull();
		expect(
			isoRangesFor({
				code: 'AWS D1.1',
				testPositions: ['3G'],
				couponType: 'plate',
				couponDiameterMm: null
			})
		).toBeNull();
	});
	it('prints ISO 6947 beside the ASME test positions', () => {
		expect(withIso6947(['3G', '2F', 'X'])).toBe('3G (PF/PG), 2F (PB), X');
		// ISO 6947:2011 Table B.1: 3G uphill PF, downhill PG; 2F PB (GOST R ISO 6947-2017, identical)
		expect(asmeToIsoSource('3G').kind).toBe('published');
	});
});
