// The welding variables, each described once: its words, the kind of quantity it holds (and so
// its unit in either system), its choices, the processes it applies to, and how a WPS holds it
// (a range or one limit). The five forms render from this with the components of
// $lib/components/fields; the procedure schema and the sheet read the WPS placement from it.
import type { Process, UnitSystem } from '$lib/weld';
import { BEAD_LABELS, BEADS, PASS_LABELS, PASSES, PROGRESSIONS } from '$lib/procedures/options';
import type { QuantityKind } from '$lib/procedures/quantities';
import {
	CURRENT_TYPES,
	JOINT_LABELS,
	JOINT_TYPES,
	POSITIONS,
	PROCESS_LABELS,
	PROCESSES,
	TRANSFER_LABELS,
	TRANSFERS
} from '$lib/records/options';

export type UnitKind = QuantityKind;
export interface Choice {
	value: string;
	label: string;
}

/** Where a WPS revision keeps the variable: `variables.<group>.<key>`, as a range or one limit. */
export interface WpsPlacement {
	/** The editor's field name (a range posts `<field>Min` and `<field>Max`). */
	field: string;
	shape: 'range' | 'single';
	group: string;
	key: string;
	/** The revision's own words where they differ from the variable's label. */
	label?: string;
}

export interface Variable {
	label: string;
	unit?: UnitKind;
	choices?: readonly Choice[];
	/** The processes it applies to; absent: all of them. */
	processes?: readonly Process[];
	wps?: WpsPlacement;
}

const choices = <T extends string>(values: readonly T[], labels?: Partial<Record<T, string>>) =>
	values.map((v) => ({ value: v, label: labels?.[v] ?? v }));

const WIRE: readonly Process[] = ['GMAW', 'FCAW'];
const GAS: readonly Process[] = ['GTAW', 'GMAW', 'FCAW'];

export const VARIABLES = {
	process: { label: 'Process', choices: choices(PROCESSES, PROCESS_LABELS) },
	currentType: { label: 'Current and polarity', choices: choices(CURRENT_TYPES) },
	transfer: {
		label: 'Transfer mode',
		choices: choices(TRANSFERS, TRANSFER_LABELS),
		processes: ['GMAW']
	},
	amps: {
		label: 'Amperage',
		unit: 'amps',
		wps: { field: 'amps', shape: 'range', group: 'electrical', key: 'amps' }
	},
	volts: {
		label: 'Voltage',
		unit: 'volts',
		wps: { field: 'volts', shape: 'range', group: 'electrical', key: 'volts' }
	},
	wireFeed: {
		label: 'Wire feed speed',
		unit: 'wire',
		processes: WIRE,
		wps: { field: 'wireFeed', shape: 'range', group: 'electrical', key: 'wireFeedMmPerS' }
	},
	travelSpeed: {
		label: 'Travel speed',
		unit: 'travel',
		wps: { field: 'travelSpeed', shape: 'range', group: 'technique', key: 'travelSpeedMmPerS' }
	},
	heatInput: {
		label: 'Heat input',
		unit: 'heatInput',
		wps: {
			field: 'heatInputMax',
			shape: 'single',
			group: 'electrical',
			key: 'heatInputMaxJPerMm',
			label: 'Maximum heat input'
		}
	},
	fillerClass: { label: 'Filler classification' },
	fillerDiameter: {
		label: 'Filler diameter',
		unit: 'diameter',
		wps: { field: 'fillerDiameter', shape: 'range', group: 'fillerMetals', key: 'diameterMm' }
	},
	tungstenClass: { label: 'Tungsten classification', processes: ['GTAW'] },
	tungstenDiameter: {
		label: 'Tungsten diameter',
		unit: 'diameter',
		processes: ['GTAW'],
		wps: {
			field: 'tungstenDiameter',
			shape: 'range',
			group: 'electrical',
			key: 'tungstenDiameterMm'
		}
	},
	gasName: { label: 'Shielding gas', processes: GAS },
	gasFlow: {
		label: 'Gas flow',
		unit: 'flow',
		processes: GAS,
		wps: {
			field: 'gasFlow',
			shape: 'range',
			group: 'gas',
			key: 'flowLPerMin',
			label: 'Shielding gas flow'
		}
	},
	baseMetalSpec: { label: 'Base metal' },
	thickness: {
		label: 'Thickness',
		unit: 'thickness',
		wps: {
			field: 'thickness',
			shape: 'range',
			group: 'baseMetals',
			key: 'thicknessMm',
			label: 'Base metal thickness'
		}
	},
	couponThickness: { label: 'Coupon thickness T', unit: 'thickness' },
	depositedThickness: { label: 'Deposited weld metal t', unit: 'thickness' },
	jointType: { label: 'Joint', choices: choices(JOINT_TYPES, JOINT_LABELS) },
	position: { label: 'Position', choices: choices(POSITIONS) },
	progression: { label: 'Vertical progression', choices: choices(PROGRESSIONS) },
	preheat: {
		label: 'Preheat',
		unit: 'temperature',
		wps: {
			field: 'preheatMin',
			shape: 'single',
			group: 'preheat',
			key: 'minC',
			label: 'Minimum preheat'
		}
	},
	interpass: {
		label: 'Interpass',
		unit: 'temperature',
		wps: {
			field: 'interpassMax',
			shape: 'single',
			group: 'preheat',
			key: 'interpassMaxC',
			label: 'Maximum interpass'
		}
	},
	pwhtTemp: {
		label: 'PWHT temperature',
		unit: 'temperature',
		wps: { field: 'pwhtTemp', shape: 'range', group: 'pwht', key: 'temperatureC' }
	},
	bead: { label: 'Bead', choices: choices(BEADS, BEAD_LABELS) },
	passes: { label: 'Passes', choices: choices(PASSES, PASS_LABELS) }
} as const satisfies Record<string, Variable>;

export type VariableId = keyof typeof VARIABLES;

export const variable = (id: VariableId): Variable => VARIABLES[id];

/** Whether a variable applies to a process (the forms hide it where it does not). */
export function appliesTo(id: VariableId, process: unknown): boolean {
	const only: readonly string[] | undefined = (variable(id) as Variable).processes;
	return !only || only.includes(String(process));
}

const UNITS: Record<UnitKind, Record<UnitSystem, string>> = {
	amps: { imperial: 'A', metric: 'A' },
	volts: { imperial: 'V', metric: 'V' },
	thickness: { imperial: 'in', metric: 'mm' },
	diameter: { imperial: 'in', metric: 'mm' },
	travel: { imperial: 'in/min', metric: 'mm/min' },
	wire: { imperial: 'in/min', metric: 'm/min or mm/min' },
	flow: { imperial: 'CFH', metric: 'L/min' },
	temperature: { imperial: '°F', metric: '°C' },
	heatInput: { imperial: 'kJ/in', metric: 'kJ/mm' }
};

/** The unit a bare number is read in, in the reader's system. */
export const unitLabel = (unit: UnitKind, system: UnitSystem): string => UNITS[unit][system];

/** The kind of quantity a variable holds (how its text is read); text variables have none. */
export function unitOf(id: VariableId): UnitKind {
	const unit = (variable(id) as Variable).unit;
	if (!unit) throw new Error(`${id} holds no quantity`);
	return unit;
}
