// The WPS revision editor's layout: every variable as a range or one limit, grouped as the codes
// group them. Data only; RevisionEditor renders it with the field components.
import type { Entry, Section } from '$lib/components/fields/layout';
import { processEntries } from '$lib/components/fields/layout';
import { CODE_LABELS, CODES, opts } from '$lib/procedures/options';
import { VARIABLES, type Variable, type VariableId } from '$lib/schemas/variables';

/** A variable as the revision holds it: a range row or one limit, in the revision's words. */
function wps(id: VariableId, more: Partial<Entry> = {}): Entry {
	const v: Variable = VARIABLES[id];
	return {
		of: id,
		name: v.wps?.field ?? id,
		label: v.wps?.label ?? v.label,
		kind: v.wps?.shape === 'range' ? 'range' : 'quantity',
		...more
	};
}

const pwhtRequired = (values: Record<string, unknown>) => values.pwhtRequired === 'yes';

export const REVISION_SECTIONS: readonly Section[] = [
	{
		aria: 'Scope and code',
		entries: [
			{ name: 'title', label: 'Title' },
			{ name: 'code', label: 'Code it follows', choices: opts(CODES, CODE_LABELS) },
			{ name: 'codeEdition', label: 'Code edition', placeholder: 'e.g. 2020' },
			{ name: 'scope', label: 'Scope', placeholder: 'Where this procedure applies' }
		]
	},
	{
		heading: 'Process and electrical characteristics',
		aria: 'Process and electrical characteristics',
		entries: [
			...processEntries(),
			wps('amps'),
			wps('volts'),
			wps('wireFeed', { gated: true }),
			{ name: 'tungstenClass', of: 'tungstenClass', gated: true, placeholder: 'EWLa-1.5' },
			wps('tungstenDiameter', { gated: true }),
			wps('heatInput', { unitShown: 'hint' })
		]
	},
	{
		heading: 'Joints',
		aria: 'Joints',
		entries: [
			{ name: 'jointTypes', of: 'jointType', kind: 'set', label: 'Joint types', wide: true },
			{ name: 'jointDesign', label: 'Joint design', placeholder: 'Fillet, 3/16 in leg' },
			{ name: 'backing', label: 'Backing', placeholder: 'None' }
		]
	},
	{
		heading: 'Base metals',
		aria: 'Base metals',
		entries: [
			{
				name: 'baseMetalSpecs',
				label: 'Specifications',
				hint: 'Separate with commas: A36, A500 B'
			},
			wps('thickness', { hint: 'P-Numbers are read from the specifications.' })
		]
	},
	{
		heading: 'Filler metals',
		aria: 'Filler metals',
		entries: [
			{
				name: 'fillerClasses',
				label: 'Classifications',
				hint: 'AWS classifications, separated by commas; F- and A-Numbers are read from them.'
			},
			wps('fillerDiameter')
		]
	},
	{
		heading: 'Positions',
		aria: 'Positions',
		entries: [
			{ name: 'positions', of: 'position', kind: 'set', label: 'Positions', wide: true },
			{ name: 'progression', of: 'progression', empty: '—' }
		]
	},
	{
		heading: 'Preheat, interpass and post-weld heat treatment',
		aria: 'Preheat, interpass and PWHT',
		entries: [
			wps('preheat'),
			wps('interpass'),
			{
				name: 'pwhtRequired',
				label: 'PWHT',
				choices: [
					{ value: 'no', label: 'None' },
					{ value: 'yes', label: 'Required' }
				]
			},
			wps('pwhtTemp', { when: pwhtRequired }),
			{ name: 'pwhtNotes', label: 'PWHT notes', when: pwhtRequired }
		]
	},
	{
		heading: 'Shielding and backing gas',
		aria: 'Gas',
		entries: [
			{ name: 'gasName', of: 'gasName', placeholder: 'argon, 75/25' },
			wps('gasFlow'),
			{ name: 'backingGas', label: 'Backing gas', placeholder: 'None' }
		]
	},
	{
		heading: 'Technique',
		aria: 'Technique',
		entries: [
			wps('travelSpeed'),
			{ name: 'bead', of: 'bead', empty: '—' },
			{ name: 'passes', of: 'passes', empty: '—' },
			{ name: 'cleaning', label: 'Cleaning', placeholder: 'Wire brush between passes' },
			{ name: 'techniqueNotes', label: 'Technique notes', kind: 'notes', wide: true }
		]
	}
];
