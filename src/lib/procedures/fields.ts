// Where each editor field lives in the variables document, and what kind of quantity it holds:
// read from the one description of the variables ($lib/schemas/variables), listed here by the
// editor's field names so the form's types know them.
import { unitOf, VARIABLES, type Variable, type VariableId } from '$lib/schemas/variables';
import type { QuantityKind } from './quantities';

export interface QuantitySpec {
	kind: QuantityKind;
	label: string;
	group: string;
	key: string;
}

function wps(id: VariableId): QuantitySpec {
	const v: Variable = VARIABLES[id];
	if (!v.wps) throw new Error(`${id} is not a WPS variable`);
	return { kind: unitOf(id), label: v.wps.label ?? v.label, group: v.wps.group, key: v.wps.key };
}

/** Variables held as a range: the form has `<name>Min` and `<name>Max`. */
export const RANGE_FIELDS = {
	thickness: wps('thickness'),
	fillerDiameter: wps('fillerDiameter'),
	amps: wps('amps'),
	volts: wps('volts'),
	wireFeed: wps('wireFeed'),
	tungstenDiameter: wps('tungstenDiameter'),
	gasFlow: wps('gasFlow'),
	travelSpeed: wps('travelSpeed'),
	pwhtTemp: wps('pwhtTemp')
} satisfies Record<string, QuantitySpec>;

/** Variables held as one limit. */
export const SINGLE_FIELDS = {
	preheatMin: wps('preheat'),
	interpassMax: wps('interpass'),
	heatInputMax: wps('heatInput')
} satisfies Record<string, QuantitySpec>;

export type RangeField = keyof typeof RANGE_FIELDS;
export type SingleField = keyof typeof SINGLE_FIELDS;
