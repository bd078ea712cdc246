// Each procedure is judged by its own governing code (issue 15). The WPS-002 case: a D1.1
// procedure must not take its thickness from ASME IX QW-403.10.
import { describe, expect, it } from 'vitest';
import type { RevisionVariables } from '$lib/schemas/procedure';
import { revisionFindings, type PqrForFindings } from './findings';
import type { PqrQualified } from './pqr-values';
import { emptyVariables } from './variables';

const revision = (
	code: RevisionVariables['code'],
	over: (v: RevisionVariables) => void = () => {}
): RevisionVariables => {
	const v = emptyVariables({ title: 'Code test', code, process: 'GMAW' });
	over(v);
	return v;
};
const qualified = (over: Partial<PqrQualified> = {}): PqrQualified => ({
	process: 'GMAW',
	currentType: 'DCEP',
	transfer: 'short-circuit',
	amps: 180,
	volts: 19,
	// What QW-451.1 with QW-403.10 gave this coupon (1.1T): the ASME answer, stored at save.
	thickness: {
		min: { value: 1.5, unit: 'mm' },
		max: { value: 6.99, unit: 'mm' },
		row: 'QW-451.1',
		notes: [],
		source: {
			label: 'ASME BPVC Section IX QW-403.10 and QW-404.32 (GMAW short-circuit)',
			kind: 'published'
		}
	},
	depositedMax: null,
	positions: null,
	pNumbers: ['1'],
	fNumbers: [6],
	problems: [],
	...over
});
const pqr = (
	over: Partial<PqrQualified> = {},
	thicknessMm: number | null = 6.35
): PqrForFindings => ({
	number: 'PQR-7',
	qualified: qualified(over),
	coupon: { thicknessMm, transfer: 'short-circuit' }
});
const of = (v: RevisionVariables, p: PqrForFindings[], check: string) =>
	revisionFindings(v, p, 'metric').filter((f) => f.check === check);

describe('thickness by the procedure’s own code', () => {
	const range = (v: RevisionVariables) => {
		v.baseMetals.thicknessMm = { min: 3.2, max: 12.7 };
	};
	it('D1.1: the 1/4 in coupon qualifies 1/8 in to 2T by Table 4.2, not 1.1T by QW-403.10', () => {
		const found = of(revision('aws-d1.1', range), [pqr()], 'pqr-ranges');
		expect(found.map((f) => f.status)).toEqual(['ok', 'ok']); // D1.1 Table 4.2 // from memory
		expect(found[1]!.message).toContain('D1.1 Table 4.2');
		expect(found.some((f) => f.message.includes('QW-403.10'))).toBe(false);
	});
	it('ASME IX keeps QW-451.1 with QW-403.10: 12.7 mm is outside 1.1T', () => {
		const found = of(revision('asme-ix', range), [pqr()], 'pqr-ranges');
		expect(found.find((f) => f.end === 'high')?.status).toBe('outside'); // QW-403.10: 1.1 x 6.35 = 6.99 mm (API RP 577 11.3)
	});
	it('ISO 15614-1: 6.35 mm multi-run qualifies 3 to 12.7 mm (Table 7)', () => {
		const found = of(revision('iso-15609-1', range), [pqr()], 'pqr-ranges');
		expect(found.map((f) => f.status)).toEqual(['ok', 'ok']); // ISO 15614-1:2017 Table 7: 3 < t <= 12, 3 to 2t
	});
	it('with no coupon thickness recorded it says so, and borrows no other code’s range', () => {
		const found = of(revision('aws-d1.1', range), [pqr({}, null)], 'pqr-ranges');
		expect(found).toHaveLength(1);
		expect(found[0]).toMatchObject({ status: 'caution' });
		expect(found[0]!.message).toContain('no other code');
	});
});

describe('changes from the PQR by the procedure’s own code', () => {
	it('ASME IX: a change of transfer mode is essential (QW-409.2, QW-255)', () => {
		const v = revision('asme-ix', (x) => (x.electrical.transfer = 'spray'));
		const found = of(v, [pqr()], 'pqr-code-rules');
		expect(found[0]).toMatchObject({ status: 'outside', expected: { unit: 'QW-409.2' } });
	});
	it('ASME IX: a wider voltage range is nonessential (QW-409.8); no D1.1 7 % rule is applied', () => {
		const v = revision('asme-ix', (x) => (x.electrical.volts = { min: 17, max: 23 }));
		const all = revisionFindings(v, [pqr()], 'metric');
		const volts = all.filter((f) => f.check === 'pqr-code-rules' && f.at === 'volts');
		expect(volts[0]).toMatchObject({ status: 'ok', expected: { unit: 'QW-409.8' } });
		expect(all.some((f) => f.message.includes('D1.1'))).toBe(false);
	});
	it('ISO 15614-1: volts have no range of their own, and the finding says so plainly', () => {
		const v = revision('iso-15609-1', (x) => (x.electrical.volts = { min: 17, max: 23 }));
		const found = of(v, [pqr()], 'pqr-code-rules');
		expect(found[0]).toMatchObject({ status: 'caution' });
		expect(found[0]!.message).toContain('No ISO 15614-1 rule modelled for this variable');
	});
	it('ISO 15614-1: short-circuit to spray needs its own test (8.5.2.3)', () => {
		const v = revision('iso-15609-1', (x) => (x.electrical.transfer = 'spray'));
		expect(of(v, [pqr()], 'pqr-code-rules')[0]).toMatchObject({ status: 'outside' }); // ISO 15614-1:2017+A1 8.5.2.3
	});
	it('D1.1 keeps its Table 4.5 triggers, as before', () => {
		const v = revision('aws-d1.1', (x) => (x.electrical.volts = { min: 17, max: 23 }));
		const all = revisionFindings(v, [pqr()], 'metric');
		expect(all.some((f) => f.check === 'pqr-code-rules')).toBe(false);
		expect(all.some((f) => f.message.includes('PQR-7') && f.field === 'volts')).toBe(true); // D1.1 Table 4.5
	});
});
