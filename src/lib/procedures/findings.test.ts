// The revision-against-PQR findings that have no weld-core test: support, process, current type,
// P-Number and F-Number. Inputs are built by hand so each case changes one thing.
import { describe, expect, it } from 'vitest';
import type { RevisionVariables } from '$lib/schemas/procedure';
import { revisionFindings, type PqrForFindings } from './findings';
import type { PqrQualified } from './pqr-values';
import { emptyVariables } from './variables';

const revision = (over: (v: RevisionVariables) => void = () => {}): RevisionVariables => {
	const v = emptyVariables({ title: 'Findings test', code: 'asme-ix', process: 'GTAW' });
	over(v);
	return v;
};

const pqr = (number: string, over: Partial<PqrQualified> = {}): PqrForFindings => ({
	number,
	qualified: {
		process: 'GTAW',
		currentType: 'DCEN',
		transfer: null,
		amps: null,
		volts: null,
		thickness: null,
		depositedMax: null,
		positions: null,
		pNumbers: ['1'],
		fNumbers: [6],
		problems: [],
		...over
	}
});

const of = (v: RevisionVariables, pqrs: PqrForFindings[], check: string) =>
	revisionFindings(v, pqrs, 'metric').filter((f) => f.check === check);

describe('pqr-support', () => {
	it('cautions a revision under a code that cites no PQR', () => {
		// Beadline product rule (check-catalogue PRODUCT): a procedure under a code is supported by a PQR
		const found = of(revision(), [], 'pqr-support');
		expect(found).toHaveLength(1);
		expect(found[0]).toMatchObject({ status: 'caution', at: 'pqrs' });
		expect(found[0]!.message).toContain('ASME');
	});

	it('says nothing for shop practice, which claims no code', () => {
		// Beadline product rule (PRODUCT): shop practice claims no code, so needs no PQR
		const v = revision((x) => (x.code = 'shop'));
		expect(of(v, [], 'pqr-support')).toEqual([]);
		expect(revisionFindings(v, [], 'metric').some((f) => f.check.startsWith('pqr-'))).toBe(false);
	});

	it('is not given once a PQR is cited', () => {
		expect(of(revision(), [pqr('PQR-1')], 'pqr-support')).toEqual([]);
	});
});

describe('pqr-process', () => {
	it('marks a PQR of another process outside, and compares nothing else against it', () => {
		// ASME IX QW-401 (Article IV, public copy): a process change is essential, needs a new PQR
		const v = revision((x) => {
			x.baseMetals.pNumbers = ['8'];
			x.electrical.currentType = 'AC';
		});
		const all = revisionFindings(v, [pqr('PQR-SMAW', { process: 'SMAW' })], 'metric');
		const found = all.filter((f) => f.check === 'pqr-process');
		expect(found).toHaveLength(1);
		expect(found[0]).toMatchObject({
			status: 'outside',
			pqr: 'PQR-SMAW',
			value: 'GTAW',
			expected: { unit: 'SMAW' },
			at: 'process'
		});
		// Only same-process PQRs are compared for P-Number, current and the rest.
		expect(all.some((f) => ['pqr-p-number', 'pqr-current-type'].includes(f.check))).toBe(false);
	});

	it('gives no finding for a PQR of the same process', () => {
		expect(of(revision(), [pqr('PQR-1')], 'pqr-process')).toEqual([]);
	});
});

describe('pqr-current-type', () => {
	it('marks a current the PQRs were not welded with outside', () => {
		// ASME IX QW-409.4, current type and polarity (QW-255/256, public checklists)
		const v = revision((x) => (x.electrical.currentType = 'AC'));
		const found = of(v, [pqr('PQR-1', { currentType: 'DCEN' })], 'pqr-current-type');
		expect(found).toHaveLength(1);
		expect(found[0]).toMatchObject({ status: 'outside', value: 'AC', expected: { unit: 'DCEN' } });
	});

	it('is ok when one of the PQRs was welded with it', () => {
		// ASME IX QW-409.4 (QW-255/256, public checklists)
		const v = revision((x) => (x.electrical.currentType = 'AC'));
		const pqrs = [pqr('PQR-1', { currentType: 'DCEN' }), pqr('PQR-2', { currentType: 'AC' })];
		expect(of(v, pqrs, 'pqr-current-type')).toMatchObject([{ status: 'ok' }]);
	});

	it('is left out when the revision gives no current type', () => {
		expect(of(revision(), [pqr('PQR-1')], 'pqr-current-type')).toEqual([]);
	});
});

describe('pqr-p-number', () => {
	it('marks a listed P-Number no PQR qualifies outside', () => {
		// ASME IX QW-403.11 / QW-424, base metals qualified by P-Number (public checklists)
		const v = revision((x) => (x.baseMetals.pNumbers = ['1', '8']));
		const found = of(v, [pqr('PQR-1', { pNumbers: ['1'] })], 'pqr-p-number');
		expect(found).toHaveLength(1);
		expect(found[0]).toMatchObject({ status: 'outside', value: 'P-1, P-8', at: 'pNumbers' });
		expect(found[0]!.message).toContain('P-8 is not qualified');
	});

	it('is ok when the PQRs between them qualify every one listed', () => {
		// ASME IX QW-403.11 / QW-424 (public checklists)
		const v = revision((x) => (x.baseMetals.pNumbers = ['1', '8']));
		const pqrs = [pqr('PQR-1', { pNumbers: ['1'] }), pqr('PQR-2', { pNumbers: ['8'] })];
		expect(of(v, pqrs, 'pqr-p-number')).toMatchObject([
			{ status: 'ok', expected: { unit: 'P-1, P-8' } }
		]);
	});

	it('is left out when the revision lists no P-Number', () => {
		expect(of(revision(), [pqr('PQR-1')], 'pqr-p-number')).toEqual([]);
	});
});

describe('pqr-f-number', () => {
	it('marks a listed F-Number no PQR was welded with outside', () => {
		// ASME IX QW-404.4, F-Number is an essential variable (QW-253 to QW-256, public checklists)
		const v = revision((x) => (x.fillerMetals.fNumbers = [6, 4]));
		const found = of(v, [pqr('PQR-1', { fNumbers: [6] })], 'pqr-f-number');
		expect(found).toHaveLength(1);
		expect(found[0]).toMatchObject({ status: 'outside', value: 'F-6, F-4', at: 'fNumbers' });
		expect(found[0]!.message).toContain('F-4 is not qualified');
	});

	it('is ok when every F-Number listed is qualified', () => {
		// ASME IX QW-404.4 (public checklists)
		const v = revision((x) => (x.fillerMetals.fNumbers = [6]));
		expect(of(v, [pqr('PQR-1', { fNumbers: [6] })], 'pqr-f-number')).toMatchObject([
			{ status: 'ok', value: 'F-6' }
		]);
	});
});
