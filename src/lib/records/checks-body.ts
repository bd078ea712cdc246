// The live checks' request (the v1 checks contract: quantities as { value, unit } in SI) and the
// map from a finding's `field` back to the form field it sits beside.
import type { RecordValues } from './values';

type Quantity = { value: number; unit: string };
const q = (value: number | null, unit: string): Quantity | undefined =>
	value === null ? undefined : { value, unit };

/** Drops undefined members so the JSON is small and stable (it is also the de-duplication key). */
function compact<T extends Record<string, unknown>>(o: T): Partial<T> | undefined {
	const out = Object.fromEntries(
		Object.entries(o).filter(([, v]) => v !== undefined && v !== null)
	);
	return Object.keys(out).length ? (out as Partial<T>) : undefined;
}

export function checksBody(v: RecordValues): Record<string, unknown> {
	return {
		process: v.process,
		...compact({
			currentType: v.currentType,
			transfer: v.transfer,
			amps: v.amps,
			volts: v.volts,
			travelSpeed: q(v.travelSpeedMmPerS, 'mm/s'),
			wireFeed: q(v.wireFeedMmPerS, 'mm/s'),
			thickness: q(v.thicknessMm, 'mm'),
			baseMetal: v.baseMetalSpec ? { spec: v.baseMetalSpec } : undefined,
			filler: compact({
				classification: v.fillerClass,
				diameter: q(v.fillerDiameterMm, 'mm')
			}),
			tungsten: compact({
				classification: v.tungstenClass,
				diameter: q(v.tungstenDiameterMm, 'mm')
			}),
			gas: compact({ name: v.gasName, flow: q(v.gasFlowLPerMin, 'L/min') })
		})
	};
}

const FIELD_MAP: Record<string, string> = {
	'filler.classification': 'fillerClass',
	'filler.diameter': 'fillerDiameter',
	filler: 'fillerClass',
	'tungsten.classification': 'tungstenClass',
	'tungsten.diameter': 'tungstenDiameter',
	tungsten: 'tungstenClass',
	'gas.name': 'gasName',
	'gas.flow': 'gasFlow',
	gas: 'gasName',
	baseMetal: 'baseMetalSpec',
	'baseMetal.spec': 'baseMetalSpec',
	'baseMetal.family': 'baseMetalSpec'
};

const FORM_FIELDS = new Set([
	'process',
	'currentType',
	'transfer',
	'amps',
	'volts',
	'wireFeed',
	'travelSpeed',
	'thickness',
	'position',
	'preheat'
]);

/** The form field a finding belongs beside, or null for the general list. */
export function formFieldOf(field: string | undefined): string | null {
	if (!field) return null;
	if (FIELD_MAP[field]) return FIELD_MAP[field];
	return FORM_FIELDS.has(field) ? field : null;
}
