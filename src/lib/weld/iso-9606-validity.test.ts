import { describe, expect, it } from 'vitest';
import { isoWelderValidity } from './iso-9606-validity';

// ISO 9606-1:2012 9.2 and 9.3 as quoted by certification bodies (thewdc.co.uk 2021, dekra.se).
describe('six-month confirmation (9.2)', () => {
	it.each([
		// test date, confirmations, today, status, confirmBy
		['2025-01-10', ['2025-07-01', '2025-12-20'], '2026-03-01', 'current', '2026-06-20'],
		['2025-01-10', ['2025-08-01'], '2025-09-01', 'lapsed', '2025-07-10'], // gap over six months
		['2025-01-10', [], '2025-07-10', 'lapsed', '2025-07-10'], // six months passed that day
		['2025-01-10', [], '2025-07-09', 'current', '2025-07-10']
	])('test %s, confirmed %j, on %s: %s', (testDate, confirmations, today, status, confirmBy) => {
		const r = isoWelderValidity({ testDate, confirmations, route: 'c' }, today);
		expect(r).toMatchObject({ ok: true, status, confirmBy });
	});
	it('a late confirmation does not revive a lapsed qualification', () => {
		const r = isoWelderValidity(
			{ testDate: '2025-01-10', confirmations: ['2025-08-01', '2025-12-01'] },
			'2026-01-01'
		);
		expect(r).toMatchObject({ ok: true, status: 'lapsed' });
	});
});

describe('revalidation routes (9.3)', () => {
	const every5 = [
		'2023-06-01',
		'2023-11-01',
		'2024-04-01',
		'2024-09-01',
		'2025-02-01',
		'2025-07-01',
		'2025-12-01'
	];
	it.each([
		// a) retest every three years
		[
			{ testDate: '2023-01-10', confirmations: every5, route: 'a' },
			'2025-12-20',
			'current',
			'2026-01-10'
		],
		[
			{ testDate: '2023-01-10', confirmations: every5, route: 'a' },
			'2026-02-01',
			'expired',
			'2026-01-10'
		],
		// b) every two years with two tested welds from the six months before
		[
			{
				testDate: '2024-01-10',
				confirmations: every5.slice(2),
				route: 'b',
				testedWelds: ['2025-09-01', '2025-11-15']
			},
			'2026-03-01',
			'current',
			'2028-01-10'
		],
		[
			{
				testDate: '2024-01-10',
				confirmations: every5.slice(2),
				route: 'b',
				testedWelds: ['2025-11-15']
			},
			'2026-03-01',
			'expired',
			'2026-01-10'
		],
		[
			{
				testDate: '2024-01-10',
				confirmations: every5.slice(2),
				route: 'b',
				testedWelds: ['2025-03-01', '2025-11-15']
			},
			'2026-03-01',
			'expired',
			'2026-01-10'
		], // one weld outside the window
		// c) no end date while confirmed
		[
			{
				testDate: '2020-01-10',
				confirmations: ['2020-06-01', '2020-11-01', '2021-04-01'],
				route: 'c'
			},
			'2021-06-01',
			'current',
			null
		]
	])('%j on %s: %s until %s', (input, today, status, validUntil) => {
		expect(isoWelderValidity(input, today)).toMatchObject({ ok: true, status, validUntil });
	});
	it('route c says it is not accepted for PED categories II-IV', () => {
		const r = isoWelderValidity({ testDate: '2025-01-10', route: 'c' }, '2025-02-01');
		expect(r.ok && r.reason).toContain('PED');
	});
	it('refuses unreadable dates', () => {
		expect(isoWelderValidity({ testDate: 'x' }, '2025-01-01').ok).toBe(false);
		expect(isoWelderValidity({ testDate: '2025-01-01' }, 'y').ok).toBe(false);
		expect(isoWelderValidity({ testDate: '2026-01-01' }, '2025-01-01').ok).toBe(false);
	});
});
