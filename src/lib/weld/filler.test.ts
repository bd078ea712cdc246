import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fillerSuits, parseFiller, wrongFamily, type Filler } from './filler';
import { checkFillerClassification, checkFillerVsBaseMetal } from './filler-checks';

const get = (text: string): Filler => {
	const r = parseFiller(text);
	if (!r.ok) throw new Error(r.message);
	return r.filler;
};

describe('AWS A5.18 carbon steel solid wire and rod', () => {
	it('ER70S-6 -> 70 ksi, F-6, A-1, carbon steel', () => {
		const f = get('ER70S-6');
		expect(f.spec).toBe('AWS A5.18');
		expect(f.minTensileKsi).toBe(70); // AWS A5.18: "70" = 70 ksi minimum tensile
		expect(f.fNumber).toBe(6); // ASME BPVC IX QW-432: A5.18 is F-6
		expect(f.aNumber).toBe(1); // ASME BPVC IX QW-442: A-1 (mild steel)
		expect(f.family).toBe('carbon-steel');
		expect(f.fNumberSource.kind).toBe('published');
	});
	it('reads -2 and -3, loose spellings and a spec prefix', () => {
		expect(get('ER70S-2').classification).toBe('ER70S-2');
		expect(get('er70s3').classification).toBe('ER70S-3');
		expect(get('AWS A5.18 ER70S-6').classification).toBe('ER70S-6');
		expect(get(' ER70S–6 ').classification).toBe('ER70S-6');
	});
	it('ER48S-6 is the A5.18M metric twin of ER70S-6', () => {
		const f = get('ER48S-6'); // AWS A5.18M: 48 = 480 MPa
		expect(f.classification).toBe('ER70S-6');
		expect(f.enteredAs).toBe('ER48S-6');
		expect(f.fNumber).toBe(6);
	});
	it('ER70S-G reads, with the A-Number left to the deposit', () => {
		const f = get('ER70S-G');
		expect(f.aNumber).toBeNull();
		expect(f.inTable).toBe(false);
	});
	it('an unknown suffix says what A5.18 lists', () => {
		const r = parseFiller('ER70S-9');
		expect(r.ok).toBe(false);
		if (!r.ok) expect(r.message).toContain('-2, -3, -4, -6, -7');
	});
});

describe('other specifications', () => {
	it('A5.28 low-alloy: ER80S-D2, ER80S-B2', () => {
		expect(get('ER80S-D2')).toMatchObject({
			spec: 'AWS A5.28',
			minTensileKsi: 80,
			fNumber: 6,
			family: 'low-alloy'
		}); // QW-432: A5.28 is F-6
		// A-3 (Cr 0.40-2.00, Mo 0.40-0.65) for 1-1/4 Cr - 1/2 Mo: ISO 15614-1:2017 Table A.2 (the QW-442 ranges)
		expect(get('ER80S-B2')).toMatchObject({ minTensileKsi: 80, fNumber: 6, aNumber: 3 });
		expect(get('ER80S-B2').aNumberSource.kind).toBe('published');
	});
	it('A5.9 stainless: ER308L, ER309L, ER316L (L = low carbon)', () => {
		for (const c of ['ER308L', 'ER309L', 'ER316L']) {
			const f = get(c);
			expect(f).toMatchObject({
				spec: 'AWS A5.9',
				family: 'stainless',
				fNumber: 6,
				aNumber: 8,
				minTensileKsi: null
			}); // QW-432 F-6; A-8 (Cr 14.50-30.00, Ni 7.50-15.00): ISO 15614-1:2017 Table A.2
			expect(f.meaning).toContain('low carbon');
		}
		expect(get('ER308LSi').classification).toBe('ER308LSi');
		expect(get('ER347').inTable).toBe(false);
	});
	it('A5.10 aluminium: ER4043 F-23, ER5356 F-22, no A-Number', () => {
		// F23 and F22: AWS D1.2/D1.2M:2014 Clause 3 filler metal groups (public copy,
		// scribd.com/document/528227606); no A-Number: the twelve QW-442 ranges (ISO 15614-1:2017 Table A.2) are ferrous
		expect(get('ER4043')).toMatchObject({
			spec: 'AWS A5.10',
			family: 'aluminium',
			fNumber: 23,
			aNumber: null
		});
		expect(get('ER5356')).toMatchObject({ fNumber: 22, aNumber: null });
		expect(get('R4043').classification).toBe('ER4043');
		expect(parseFiller('ER9999').ok).toBe(false);
	});
	it('A5.20 flux-cored: E71T-1C (CO2), E71T-1M (argon mix), E71T-11 self-shielded', () => {
		expect(get('E71T-1C')).toMatchObject({
			spec: 'AWS A5.20',
			minTensileKsi: 70,
			fNumber: 6,
			gas: 'CO2',
			currents: ['DCEP']
		});
		expect(get('E71T-1M')).toMatchObject({ gas: 'Ar/CO2 75-80 %' });
		expect(get('E71T-11')).toMatchObject({ gas: 'none', currents: ['DCEN'] });
		expect(get('E70T-1C').meaning).toContain('flat and horizontal');
		expect(parseFiller('E71T-1').ok).toBe(false); // gas letter needed
	});
	it('A5.1 covered electrodes: E7018 (F-4, low hydrogen), E6010 (F-3)', () => {
		expect(get('E7018')).toMatchObject({
			spec: 'AWS A5.1',
			minTensileKsi: 70,
			fNumber: 4,
			aNumber: 1
		}); // F-4 for EXX18: ISO 15614-1:2017 Table A.1 (QW-432 groups); A-1 mild steel: Table A.2
		expect(get('E7018-1 H4R').classification).toBe('E7018-1');
		// F-3 for EXX10: ISO 15614-1:2017 Table A.1; 6010 on DCEP (electrode positive): the
		// electrode selection chart of a maker's stick welder operating manual (OM-267 212, 13-2/13-3).
		expect(get('E6010')).toMatchObject({ minTensileKsi: 60, fNumber: 3, currents: ['DCEP'] });
		expect(get('E6010').fNumberSource.kind).toBe('published');
	});
	it('malformed or empty input gets a clear message', () => {
		for (const bad of [
			'',
			'hello',
			'7018',
			'ER',
			'E71T-99C',
			42,
			null,
			undefined,
			'x'.repeat(100)
		]) {
			const r = parseFiller(bad);
			expect(r.ok).toBe(false);
			if (!r.ok) expect(r.message.length).toBeGreaterThan(10);
		}
	});
});

describe('filler against base metal family', () => {
	it('matches and mismatches', () => {
		expect(fillerSuits(get('ER70S-6'), 'carbon-steel')).toBe('ok');
		// Issue 3 §4: a family mismatch is a caution (findings advise); common practice, no source
		expect(fillerSuits(get('ER70S-6'), 'stainless')).toBe('caution'); // AWS A5.18: carbon steel wire
		expect(fillerSuits(get('ER4043'), 'carbon-steel')).toBe('caution'); // AWS A5.10: aluminium rod
		expect(wrongFamily(get('ER70S-6'), 'stainless')).toBe(true); // AWS A5.18: carbon steel wire
		expect(wrongFamily(get('ER4043'), 'carbon-steel')).toBe(true); // AWS A5.10: aluminium rod
		expect(wrongFamily(get('ER309L'), 'carbon-steel')).toBe(false); // AWS A5.9: dissimilar-joint wire
		expect(fillerSuits(get('ER308L'), 'stainless')).toBe('ok');
		expect(fillerSuits(get('ER309L'), 'carbon-steel')).toBe('caution'); // dissimilar-joint wire
		expect(fillerSuits(get('ER80S-D2'), 'carbon-steel')).toBe('caution');
	});
	it('findings name the field', () => {
		const f = checkFillerVsBaseMetal({
			s: { process: 'GTAW' },
			system: 'imperial',
			filler: get('ER4043'),
			family: 'stainless'
		});
		// AWS A5.10: ER4043 is aluminium rod; a mismatch is a caution that names the wrong family
		expect(f).toMatchObject({ status: 'caution', field: 'filler.classification' });
		expect(f?.message).toBe(
			'Wrong filler family: ER4043 is an aluminium filler and does not suit stainless.'
		);
		const c = checkFillerClassification({
			s: { process: 'GTAW', filler: { classification: 'ER70S-6' } },
			system: 'imperial'
		});
		expect(c?.message).toContain('70 ksi minimum tensile, F-6, A-1');
		const bad = checkFillerClassification({
			s: { process: 'GTAW', filler: { classification: 'nope' } },
			system: 'imperial'
		});
		expect(bad?.status).toBe('caution');
	});
});

it('never throws (fast-check)', () => {
	fc.assert(fc.property(fc.anything(), (x) => void parseFiller(x)));
	fc.assert(fc.property(fc.stringMatching(/^E?R?[0-9A-Z-]{0,10}$/), (x) => void parseFiller(x)));
});
