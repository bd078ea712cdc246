import { describe, expect, it } from 'vitest';
import { recordValues } from '$lib/records/values';
import { flattenApiBody, readFilters, settingsRecordSchema } from './settings-record';

const base = { process: 'GTAW', weldedOn: '2025-04-01' };

describe('settings record schema', () => {
	it('reads fractions, mixed numbers and units; 1 in = 25.4 mm exactly (NIST HB 44)', () => {
		const form = settingsRecordSchema.parse({
			...base,
			fillerDiameter: '3/32',
			thickness: '1-1/2',
			tungstenDiameter: '2.4 mm',
			gasFlow: '20',
			preheat: '150'
		});
		const v = recordValues(form);
		expect(v.fillerDiameterMm).toBeCloseTo(2.38125, 9);
		expect(v.thicknessMm).toBeCloseTo(38.1, 9);
		expect(v.tungstenDiameterMm).toBe(2.4);
		expect(v.gasFlowLPerMin).toBeCloseTo(9.43895, 4); // 1 CFH = 0.471947 L/min
		expect(v.preheatC).toBeCloseTo(65.556, 3);
	});

	it('puts a message at each field it cannot read, and at a future date', () => {
		const r = settingsRecordSchema.safeParse({
			...base,
			amps: 'lots',
			fillerDiameter: '3/0',
			weldedOn: '2999-01-01'
		});
		expect(r.success).toBe(false);
		const paths = r.error?.issues.map((i) => i.path.join('.'));
		expect(paths).toEqual(expect.arrayContaining(['amps', 'fillerDiameter', 'weldedOn']));
	});

	it('takes the checks contract shape in the API', () => {
		const flat = flattenApiBody({
			process: 'GMAW',
			amps: 180,
			thickness: { value: 4.8, unit: 'mm' },
			filler: { classification: 'ER70S-6', diameter: { value: 0.035, unit: 'in' } },
			gas: { name: '75/25', flow: { value: 30, unit: 'CFH' } }
		});
		expect(flat).toMatchObject({
			amps: '180',
			thickness: '4.8 mm',
			fillerClass: 'ER70S-6',
			fillerDiameter: '0.035 in',
			gasName: '75/25',
			gasFlow: '30 CFH'
		});
	});

	it('drops filter values that do not read, keeping the rest', () => {
		const f = readFilters(
			new URLSearchParams('process=TIG&position=2F&sort=nope&page=-3&tmin=1/8')
		);
		expect(f).toMatchObject({
			process: undefined,
			position: '2F',
			sort: 'weldedOn',
			page: 1,
			tmin: '1/8'
		});
	});
});
