// The qualification test form's layout: rows of one panel, data only (the page renders it with
// the field components). The ranges qualified are computed from these; nothing to type for them.
import type { Choice } from '$lib/schemas/variables';
import type { Section, Values } from '$lib/components/fields/layout';
import {
	QUALIFICATION_CODES,
	TEST_POSITIONS_BY_FORM,
	WELD_CURRENTS,
	WELD_PROCESSES
} from '$lib/schemas/welder';

const plain = (values: readonly string[]): Choice[] => values.map((v) => ({ value: v, label: v }));
/** Choices from value → words, in the order written. */
const labelled = (words: Record<string, string>): Choice[] =>
	Object.entries(words).map(([value, label]) => ({ value, label }));
const positions = (values: Values) =>
	plain(TEST_POSITIONS_BY_FORM[values.couponType === 'pipe' ? 'pipe' : 'plate']);
const row = (grid: string, entries: Section['entries']): Section => ({
	panel: false,
	grid,
	entries
});

export const QUALIFICATION_ROWS: readonly Section[] = [
	row('sm:grid-cols-3', [
		{ name: 'process', of: 'process', choices: plain(WELD_PROCESSES) },
		{ name: 'code', label: 'Code tested to', choices: plain(QUALIFICATION_CODES) },
		{ name: 'testDate', label: 'Test date', attrs: { type: 'date' } }
	]),
	row('sm:grid-cols-3', [
		{ name: 'wpsRef', label: 'WPS followed' },
		{
			name: 'couponType',
			label: 'Coupon',
			choices: labelled({ plate: 'Plate', pipe: 'Pipe' })
		},
		{
			name: 'couponDiameter',
			label: 'Pipe outside diameter',
			unit: 'thickness',
			unitShown: 'label',
			attrs: { inputmode: 'decimal' },
			when: (v) => v.couponType === 'pipe'
		}
	]),
	row('', [
		{
			name: 'testPositions',
			kind: 'set',
			label: 'Test position (QW-461.9)',
			choices: positions
		}
	]),
	row('sm:grid-cols-3', [
		{
			name: 'couponThickness',
			of: 'couponThickness',
			label: 'Coupon thickness',
			unitShown: 'label',
			hint: 'e.g. 3/8 or 9.5 mm',
			attrs: { inputmode: 'decimal' }
		},
		{
			name: 'depositThickness',
			of: 'depositedThickness',
			label: 'Deposited weld metal',
			unitShown: 'label',
			attrs: { inputmode: 'decimal' }
		},
		{
			name: 'depositLayers',
			label: 'Layers deposited',
			hint: '3 or more with 1/2 in: no thickness limit',
			attrs: { inputmode: 'numeric' }
		}
	]),
	row('sm:grid-cols-4', [
		{ name: 'fillerClass', of: 'fillerClass', hint: 'e.g. ER70S-2' },
		{
			name: 'fNumber',
			label: 'F-Number',
			hint: 'Read from the filler when left empty',
			attrs: { inputmode: 'numeric' }
		},
		{
			name: 'backing',
			label: 'Backing',
			empty: '—',
			choices: labelled({ with: 'With backing', without: 'Without backing' })
		},
		{
			name: 'currentType',
			of: 'currentType',
			label: 'Current',
			empty: '—',
			choices: plain(WELD_CURRENTS)
		}
	]),
	row('', [
		{
			name: 'results',
			label: 'Test results',
			kind: 'notes',
			rows: 3,
			placeholder: 'Visual acceptable; 2 face and 2 root bends acceptable'
		}
	])
];
