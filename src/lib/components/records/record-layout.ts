// The settings record form's layout: what one bench weld used, one value each, with the unit of
// the person's system after the label. Data only; RecordForm renders it with the field
// components and puts the live findings under the entries listed in WITH_FINDINGS.
import type { Entry, Section, Values } from '$lib/components/fields/layout';
import type { VariableId } from '$lib/schemas/variables';

const value = (id: VariableId, more: Partial<Entry> = {}): Entry => ({
	name: id,
	of: id,
	attrs: { autocomplete: 'off' },
	...more
});
const withUnit = (id: VariableId, more: Partial<Entry> = {}) =>
	value(id, { unitShown: 'label', ...more });

/** GTAW feeds a filler rod, SMAW burns an electrode, the wire processes feed wire. */
const rod = (values: Values) =>
	values.process === 'GTAW' ? 'Filler rod' : values.process === 'SMAW' ? 'Electrode' : 'Wire';

const lengthHint = {
	imperial: 'Inches: 1/8, 3/32, 0.035 — or add mm',
	metric: 'Millimetres: 3.2, 2.4 — or add in (1/8 in)'
};
const decimal = { inputmode: 'decimal', autocomplete: 'off' };

export const RECORD_SECTIONS: readonly Section[] = [
	{
		heading: 'Process',
		headingClass: '',
		entries: [
			{ name: 'process', kind: 'processGroup' },
			withUnit('amps', { attrs: decimal }),
			withUnit('volts', { attrs: decimal }),
			withUnit('wireFeed', { gated: true }),
			withUnit('travelSpeed')
		]
	},
	{
		heading: 'Filler, tungsten and gas',
		headingClass: '',
		entries: [
			value('fillerClass', {
				label: (v) => `${rod(v)} classification`,
				attrs: { list: 'fillers', autocomplete: 'off', autocapitalize: 'characters' }
			}),
			value('fillerDiameter', { label: (v) => `${rod(v)} diameter`, hint: lengthHint }),
			value('tungstenClass', { gated: true, attrs: { list: 'tungstens', autocomplete: 'off' } }),
			value('tungstenDiameter', { gated: true }),
			value('gasName', { gated: true, attrs: { list: 'gases', autocomplete: 'off' } }),
			withUnit('gasFlow', { gated: true })
		]
	},
	{
		heading: 'Base metal and joint',
		headingClass: '',
		entries: [
			value('baseMetalSpec', {
				label: 'Base metal spec and grade',
				attrs: { list: 'metals', autocomplete: 'off' }
			}),
			value('thickness', { hint: lengthHint }),
			{ name: 'jointType', of: 'jointType', empty: '—' },
			{ name: 'position', of: 'position', empty: '—' },
			withUnit('preheat'),
			withUnit('interpass')
		]
	}
];

/** The form's last part, after the checks: where and when it was welded, and how it came out. */
export const OUTCOME_SECTION: Section = {
	heading: 'Where, when and how it went',
	headingClass: '',
	entries: [
		{ name: 'machine', label: 'Machine or power source', hint: "Your shop's own name for it" },
		{ name: 'jobRef', label: 'Job or part' },
		{
			name: 'outcome',
			label: 'Outcome',
			attrs: { list: 'outcomes' },
			hint: 'In your words: sound, needs rework, rejected…'
		},
		{ name: 'weldedOn', label: 'Date welded', attrs: { type: 'date' } },
		{ name: 'defects', label: 'Defects seen', kind: 'notes', rows: 2, wide: true },
		{ name: 'notes', label: 'Notes', kind: 'notes', rows: 3, wide: true }
	]
};

/** The entries the live checks speak of; their findings stand right under them. */
export const WITH_FINDINGS: ReadonlySet<string> = new Set([
	'currentType',
	'transfer',
	'amps',
	'volts',
	'wireFeed',
	'travelSpeed',
	'fillerClass',
	'fillerDiameter',
	'tungstenClass',
	'tungstenDiameter',
	'gasName',
	'gasFlow',
	'baseMetalSpec',
	'thickness',
	'position',
	'preheat'
]);
