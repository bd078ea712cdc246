import { describe, expect, it } from 'vitest';
import { revisionFormSchema } from '$lib/schemas/procedure';
import { diffRows } from './display';
import { positionLetters } from './findings';
import { applyPattern } from './numbering';
import { formToVariables, recordIdsFrom, variablesToForm } from './variables';

const form = (units: 'imperial' | 'metric', over: Record<string, unknown> = {}) =>
	revisionFormSchema.parse({
		units,
		title: 'Round trip',
		process: 'GTAW',
		ampsMin: '115',
		ampsMax: '135',
		thicknessMin: units === 'imperial' ? '1/8' : '3.2 mm',
		thicknessMax: units === 'imperial' ? '3/16 in' : '4.8',
		travelSpeedMin: '4',
		travelSpeedMax: '6',
		gasFlowMin: '15',
		gasFlowMax: '20',
		preheatMin: '50',
		baseMetalSpecs: 'A36, A500 B',
		fillerClasses: 'er70s-6',
		positions: ['2F', '1F'],
		...over
	});

describe('the variables document', () => {
	it('stores SI: 1/8 in is 3.175 mm exactly, 4 in/min is 1.6933 mm/s', () => {
		const v = formToVariables(form('imperial'));
		expect(v.baseMetals.thicknessMm.min).toBeCloseTo(3.175, 9); // 25.4 mm/in, exact
		expect(v.technique.travelSpeedMmPerS.min).toBeCloseTo((4 * 25.4) / 60, 9);
		expect(v.fillerMetals).toMatchObject({
			classifications: ['ER70S-6'],
			fNumbers: [6],
			aNumbers: [1]
		});
		expect(v.baseMetals).toMatchObject({ family: 'carbon-steel', pNumbers: ['1'] });
	});

	for (const units of ['imperial', 'metric'] as const)
		it(`reads back the same in ${units} (form → document → form → document)`, () => {
			const doc = formToVariables(form(units));
			const again = formToVariables(
				revisionFormSchema.parse(variablesToForm(doc, { pqrIds: [], recordIds: [] }, units))
			);
			for (const row of diffRows(doc, again, units)) expect(row.changed, row.key).toBe(false);
		});

	it('refuses a range whose maximum is below its minimum, at the maximum', () => {
		const r = revisionFormSchema.safeParse({ title: 'x', ampsMin: '140', ampsMax: '120' });
		expect(r.success).toBe(false);
		expect(r.error?.issues.map((i) => i.path.join('.'))).toContain('ampsMax');
	});

	it('reads record numbers and production positions', () => {
		expect(recordIdsFrom('#12, 15 15 x')).toEqual([12, 15]);
		expect(positionLetters('2F')).toEqual({ kind: 'fillet', letters: ['H'] });
		expect(positionLetters('6G')).toEqual({ kind: 'groove', letters: ['F', 'H', 'V', 'O'] });
		expect(positionLetters('7G')).toBeNull();
	});

	it('numbers by the shop pattern', () => {
		expect(applyPattern('WPS-{seq:3}', 7, 'GTAW')).toBe('WPS-007');
		expect(applyPattern('{process}-{yyyy}-{seq}', 12, 'GMAW', new Date('2026-02-01'))).toBe(
			'GMAW-2026-12'
		);
	});
});
