import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { QW_461_9, QW_461_9_COMBINATIONS } from '$reference/asme-ix-qw-461-9';
import {
	pqrThicknessRange,
	welderDepositThickness,
	welderDiameterRange,
	welderPositions
} from './qualified-ranges';

const range = (T: number, unit: 'in' | 'mm' = 'in', t?: number) => {
	const r = pqrThicknessRange({ value: T, unit }, t === undefined ? undefined : { value: t, unit });
	if (!r.ok) throw new Error(r.message);
	return {
		min: r.baseMetal.min.value,
		max: r.baseMetal.max.value,
		dep: r.depositedMax?.value,
		row: r.row
	};
};

describe('ASME BPVC IX QW-451.1, row by row (inches)', () => {
	it('T less than 1/16 in: T to 2T', () => {
		expect(range(0.05, 'in', 0.05)).toMatchObject({ min: 0.05, max: 0.1, dep: 0.1 }); // QW-451.1
	});
	it('1/16 to 3/8 in incl.: 1/16 in to 2T', () => {
		expect(range(1 / 16)).toMatchObject({ min: 0.0625, max: 0.125 }); // QW-451.1, lower edge
		expect(range(1 / 8, 'in', 1 / 8)).toMatchObject({ min: 0.0625, max: 0.25, dep: 0.25 }); // QW-451.1
		expect(range(3 / 8)).toMatchObject({ min: 0.0625, max: 0.75 }); // QW-451.1, 3/8 in is included
	});
	it('over 3/8 in but less than 3/4 in: 3/16 in to 2T', () => {
		expect(range(0.376)).toMatchObject({ min: 0.1875, max: 0.752 }); // QW-451.1
		expect(range(1 / 2, 'in', 0.5)).toMatchObject({ min: 0.1875, max: 1, dep: 1 }); // QW-451.1
	});
	it('3/4 to less than 1-1/2 in: 3/16 in to 2T; t >= 3/4 in qualifies 2T', () => {
		expect(range(3 / 4, 'in', 0.5)).toMatchObject({ min: 0.1875, max: 1.5, dep: 1 }); // QW-451.1, 2t
		expect(range(1, 'in', 0.75)).toMatchObject({ min: 0.1875, max: 2, dep: 2 }); // QW-451.1, 2T
	});
	it('1-1/2 to 6 in incl.: 3/16 in to 8 in; t >= 3/4 in qualifies 8 in', () => {
		expect(range(1.5, 'in', 0.5)).toMatchObject({ min: 0.1875, max: 8, dep: 1 }); // QW-451.1
		expect(range(6, 'in', 1)).toMatchObject({ min: 0.1875, max: 8, dep: 8 }); // QW-451.1, 6 in included
	});
	it('over 6 in: 3/16 in to 1.33T; t >= 3/4 in qualifies 1.33T', () => {
		expect(range(7, 'in', 1)).toMatchObject({ min: 0.1875, max: 9.31, dep: 9.31 }); // QW-451.1
		expect(range(7, 'in', 0.5)).toMatchObject({ dep: 1 }); // QW-451.1, 2t
	});
});

describe('QW-451.1 in mm uses the code’s metric values', () => {
	it('rows and fixed limits in mm', () => {
		expect(range(1.2, 'mm')).toMatchObject({ min: 1.2, max: 2.4 }); // < 1.5 mm: T to 2T
		expect(range(6, 'mm', 6)).toMatchObject({ min: 1.5, max: 12, dep: 12 }); // 1.5-10 mm: 1.5 mm to 2T
		expect(range(10, 'mm')).toMatchObject({ min: 1.5, max: 20 }); // 10 mm included
		expect(range(12, 'mm')).toMatchObject({ min: 5, max: 24 }); // over 10 to < 19: 5 mm to 2T
		expect(range(25, 'mm', 20)).toMatchObject({ min: 5, max: 50, dep: 50 }); // 19 to < 38: 2T when t >= 19
		expect(range(50, 'mm', 25)).toMatchObject({ min: 5, max: 200, dep: 200 }); // 38-150: 200 mm
		expect(range(160, 'mm', 10)).toMatchObject({ min: 5, max: 212.8, dep: 20 }); // over 150: 1.33T
	});
	it('a deposit given in another unit is answered in its own unit', () => {
		const r = pqrThicknessRange({ value: 1, unit: 'in' }, { value: 20, unit: 'mm' });
		expect(r.ok && r.depositedMax).toEqual({ value: 50.8, unit: 'mm' }); // 2T = 2 in = 50.8 mm
	});
});

describe('QW-451.1 exceptions and bad input', () => {
	// QW-403.10 / QW-404.32: 1.1 times the coupon (deposit) under 1/2 in, as stated in API RP 577 11.3.
	it('GMAW short-circuit under 1/2 in: 1.1T (QW-403.10) and 1.1t (QW-404.32)', () => {
		const r = pqrThicknessRange(
			{ value: 0.25, unit: 'in' },
			{ value: 0.25, unit: 'in' },
			'short-circuit'
		);
		expect(r.ok && r.baseMetal.max.value).toBe(0.275); // 1.1 x 0.25 in, QW-403.10 (API RP 577 11.3)
		expect(r.ok && r.depositedMax?.value).toBe(0.275); // 1.1 x 0.25 in, QW-404.32 (API RP 577 11.3)
		expect(r.ok && r.source.kind).toBe('published');
	});
	it('refuses non-lengths', () => {
		for (const bad of [
			null,
			{ value: 0, unit: 'in' },
			{ value: -1, unit: 'mm' },
			{ value: 1, unit: 'ft' },
			{ value: NaN, unit: 'in' }
		])
			expect(pqrThicknessRange(bad).ok).toBe(false);
		expect(pqrThicknessRange({ value: 1, unit: 'in' }, { value: 0, unit: 'in' }).ok).toBe(false);
	});
});

describe('ASME BPVC IX QW-461.9 welder positions, row by row', () => {
	const expectRow = (test: string, groove: string[], groovePipe: string[], fillet: string[]) => {
		const r = welderPositions([test]);
		expect({ groove: r.groove, groovePipe: r.groovePipe, fillet: r.fillet }).toEqual({
			groove,
			groovePipe,
			fillet
		});
	};
	const ALL = ['F', 'H', 'V', 'O'];
	it('plate groove', () => {
		expectRow('1G', ['F'], ['F'], ['F']); // QW-461.9
		expectRow('2G', ['F', 'H'], ['F', 'H'], ['F', 'H']); // QW-461.9
		expectRow('3G', ['F', 'V'], ['F'], ['F', 'H', 'V']); // QW-461.9
		expectRow('4G', ['F', 'O'], ['F'], ['F', 'H', 'O']); // QW-461.9
	});
	it('plate fillet', () => {
		expectRow('1F', [], [], ['F']); // QW-461.9
		expectRow('2F', [], [], ['F', 'H']); // QW-461.9
		expectRow('3F', [], [], ['F', 'H', 'V']); // QW-461.9
		expectRow('4F', [], [], ['F', 'H', 'O']); // QW-461.9
	});
	it('pipe groove and fillet', () => {
		expectRow('5G', ['F', 'V', 'O'], ['F', 'V', 'O'], ALL); // QW-461.9
		expectRow('6G', ALL, ALL, ALL); // QW-461.9
		expectRow('2FR', [], [], ['F', 'H']); // QW-461.9
		expectRow('5F', [], [], ALL); // QW-461.9
	});
	it('combination rows equal the union of their single rows', () => {
		for (const combo of QW_461_9_COMBINATIONS) {
			const r = welderPositions(combo.test.split('+'));
			expect(r.groove).toEqual([...combo.groove]);
			expect(r.groovePipe).toEqual([...combo.groovePipe]);
			expect(r.fillet).toEqual([...combo.fillet]);
		}
	});
	it('reports unknown positions and accepts lower case', () => {
		const r = welderPositions(['3g', '7G', 42]);
		expect(r.groove).toEqual(['F', 'V']);
		expect(r.unknown).toEqual(['7G', '42']);
		expect(welderPositions('3G').groove).toEqual([]);
	});
	it('every single row of the reference table is reachable', () => {
		for (const row of QW_461_9) expect(welderPositions([row.test]).unknown).toEqual([]);
	});
});

describe('welder thickness and diameter limits', () => {
	it('QW-452.1(b): 2t; 1/2 in (13 mm) and over with 3 layers: maximum to be welded', () => {
		expect(welderDepositThickness({ value: 0.25, unit: 'in' })).toMatchObject({
			ok: true,
			max: { value: 0.5, unit: 'in' }
		}); // QW-452.1(b)
		expect(welderDepositThickness({ value: 0.5, unit: 'in' }, 3)).toMatchObject({
			ok: true,
			max: 'unlimited'
		}); // QW-452.1(b)
		expect(welderDepositThickness({ value: 0.5, unit: 'in' }, 2)).toMatchObject({
			max: { value: 1 }
		});
		expect(welderDepositThickness({ value: 13, unit: 'mm' }, 3)).toMatchObject({
			max: 'unlimited'
		});
	});
	it('QW-452.3: under 1 in size welded; 1 to 2-7/8 in: 1 in; over 2-7/8 in: 2-7/8 in', () => {
		expect(welderDiameterRange({ value: 0.84, unit: 'in' })).toMatchObject({
			min: 'size welded',
			max: 'unlimited'
		}); // QW-452.3
		expect(welderDiameterRange({ value: 1, unit: 'in' })).toMatchObject({
			min: { value: 1, unit: 'in' }
		}); // QW-452.3
		expect(welderDiameterRange({ value: 2.875, unit: 'in' })).toMatchObject({
			min: { value: 1, unit: 'in' }
		}); // QW-452.3
		expect(welderDiameterRange({ value: 6.625, unit: 'in' })).toMatchObject({
			min: { value: 2.875, unit: 'in' }
		}); // QW-452.3
		expect(welderDiameterRange({ value: 60.3, unit: 'mm' })).toMatchObject({
			min: { value: 25, unit: 'mm' }
		}); // QW-452.3
		expect(welderDiameterRange({ value: 73.1, unit: 'mm' })).toMatchObject({
			min: { value: 73, unit: 'mm' }
		});
	});
});

it('never throws (fast-check)', () => {
	fc.assert(
		fc.property(fc.anything(), fc.anything(), (a, b) => {
			pqrThicknessRange(a, b);
			welderPositions(a);
			welderDepositThickness(a, b as number);
			welderDiameterRange(a);
		})
	);
	fc.assert(
		fc.property(
			fc.double({ min: 0.001, max: 1000, noNaN: true }),
			fc.constantFrom('in', 'mm' as const),
			(v, unit) => {
				const r = pqrThicknessRange({ value: v, unit }, { value: v / 2, unit });
				expect(r.ok).toBe(true);
				if (r.ok) expect(r.baseMetal.min.value).toBeLessThanOrEqual(r.baseMetal.max.value);
			}
		)
	);
});
