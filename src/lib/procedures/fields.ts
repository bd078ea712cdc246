// Where each editor field lives in the variables document, and what kind of quantity it holds.
import type { QuantityKind } from './quantities';

export interface QuantitySpec {
	kind: QuantityKind;
	label: string;
	group: string;
	key: string;
}

/** Variables held as a range: the form has `<name>Min` and `<name>Max`. */
export const RANGE_FIELDS = {
	thickness: {
		kind: 'thickness',
		label: 'Base metal thickness',
		group: 'baseMetals',
		key: 'thicknessMm'
	},
	fillerDiameter: {
		kind: 'diameter',
		label: 'Filler diameter',
		group: 'fillerMetals',
		key: 'diameterMm'
	},
	amps: { kind: 'amps', label: 'Amperage', group: 'electrical', key: 'amps' },
	volts: { kind: 'volts', label: 'Voltage', group: 'electrical', key: 'volts' },
	wireFeed: { kind: 'wire', label: 'Wire feed speed', group: 'electrical', key: 'wireFeedMmPerS' },
	tungstenDiameter: {
		kind: 'diameter',
		label: 'Tungsten diameter',
		group: 'electrical',
		key: 'tungstenDiameterMm'
	},
	gasFlow: { kind: 'flow', label: 'Shielding gas flow', group: 'gas', key: 'flowLPerMin' },
	travelSpeed: {
		kind: 'travel',
		label: 'Travel speed',
		group: 'technique',
		key: 'travelSpeedMmPerS'
	},
	pwhtTemp: { kind: 'temperature', label: 'PWHT temperature', group: 'pwht', key: 'temperatureC' }
} as const satisfies Record<string, QuantitySpec>;

/** Variables held as one limit. */
export const SINGLE_FIELDS = {
	preheatMin: { kind: 'temperature', label: 'Minimum preheat', group: 'preheat', key: 'minC' },
	interpassMax: {
		kind: 'temperature',
		label: 'Maximum interpass',
		group: 'preheat',
		key: 'interpassMaxC'
	},
	heatInputMax: {
		kind: 'heatInput',
		label: 'Maximum heat input',
		group: 'electrical',
		key: 'heatInputMaxJPerMm'
	}
} as const satisfies Record<string, QuantitySpec>;

export type RangeField = keyof typeof RANGE_FIELDS;
export type SingleField = keyof typeof SINGLE_FIELDS;
