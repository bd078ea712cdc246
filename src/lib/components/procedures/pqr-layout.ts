// The PQR form's layout: the actual values used on the coupon, one value each. Data only;
// PqrFormView renders it with the field components.
import { processEntries, type Entry, type Section } from '$lib/components/fields/layout';
import { PQR_CODE_LABELS, PQR_CODES } from '$lib/procedures/default-code';
import {
	ENERGY_UNITS,
	opts,
	STRENGTH_UNITS,
	TEST_RESULTS,
	type TestKind
} from '$lib/procedures/options';
import type { VariableId } from '$lib/schemas/variables';

const value = (id: VariableId, more: Partial<Entry> = {}): Entry => ({ name: id, of: id, ...more });

export const PQR_SECTIONS: readonly Section[] = [
	{
		aria: 'PQR',
		entries: [
			{ name: 'number', label: 'Number' },
			{ name: 'title', label: 'Title' },
			{
				name: 'code',
				label: 'Code it is qualified to',
				choices: opts(PQR_CODES, PQR_CODE_LABELS)
			},
			{ name: 'weldedOn', label: 'Date welded', attrs: { type: 'date' } },
			{ name: 'welder', label: 'Welder' },
			{ name: 'lab', label: 'Testing lab' }
		]
	},
	{
		heading: 'Actual values used on the coupon',
		aria: 'Actual values',
		grid: 'sm:grid-cols-2 lg:grid-cols-3',
		entries: [
			...processEntries(),
			value('fillerClass'),
			value('tungstenClass', { label: 'Tungsten', gated: true }),
			value('gasName'),
			value('baseMetalSpec', { placeholder: 'A36' }),
			{ name: 'testPosition', of: 'position', label: 'Test position', empty: '—' },
			value('jointType', { empty: '—' }),
			{ name: 'pwht', label: 'PWHT', placeholder: 'None' },
			value('amps'),
			value('volts'),
			value('travelSpeed'),
			value('wireFeed'),
			value('fillerDiameter'),
			value('tungstenDiameter'),
			value('gasFlow'),
			value('couponThickness', { hint: 'Sets the thickness range qualified (QW-451.1).' }),
			value('depositedThickness'),
			value('preheat'),
			value('interpass')
		]
	}
];

const results = opts(TEST_RESULTS, { pass: 'Pass', fail: 'Fail' });
const decimal = { inputmode: 'decimal' };

/** Each test's result and notes. */
export const testEntries = (kind: TestKind): Entry[] => [
	{ name: `${kind}Result`, label: 'Result', choices: results, empty: '—' },
	{ name: `${kind}Notes`, label: 'Notes' }
];

/** What some tests measure besides: the tensile strengths, the absorbed energy. */
export const TEST_VALUES: Partial<Record<TestKind, readonly Entry[]>> = {
	tensile: [
		{ name: 'tensile1', label: 'Specimen 1 strength', attrs: decimal },
		{ name: 'tensile2', label: 'Specimen 2 strength', attrs: decimal },
		{ name: 'tensileUnit', label: 'Unit', choices: opts(STRENGTH_UNITS) }
	],
	impact: [
		{ name: 'impactEnergy', label: 'Absorbed energy', attrs: decimal },
		{ name: 'impactUnit', label: 'Unit', choices: opts(ENERGY_UNITS) },
		{ name: 'impactTemperature', label: 'Test temperature' }
	]
};
