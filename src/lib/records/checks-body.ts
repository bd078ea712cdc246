// The live checks' request (the v1 checks contract: quantities as { value, unit }, sent in the
// reader's units because the API answers in the units it is asked in) and the map from a
// finding's `field` back to the form field it sits beside.
import {
	cToTemperature,
	lPerMinToFlow,
	mmPerSToSpeed,
	mmToLength,
	type UnitSystem
} from '$lib/weld';
import type { RecordValues } from './values';

type Quantity = { value: number; unit: string };
const q = (value: number | null, unit: string): Quantity | undefined =>
	value === null ? undefined : { value, unit };

function inUnits(system: UnitSystem) {
	const imp = system === 'imperial';
	const lengthUnit = imp ? 'in' : 'mm';
	const speedUnit = imp ? 'in/min' : 'mm/min';
	const flowUnit = imp ? 'CFH' : 'L/min';
	const tempUnit = imp ? 'degF' : 'degC';
	return {
		length: (mm: number | null) => q(mm === null ? null : mmToLength(mm, lengthUnit), lengthUnit),
		speed: (v: number | null) => q(v === null ? null : mmPerSToSpeed(v, speedUnit), speedUnit),
		flow: (v: number | null) => q(v === null ? null : lPerMinToFlow(v, flowUnit), flowUnit),
		temperature: (c: number | null) => q(c === null ? null : cToTemperature(c, tempUnit), tempUnit)
	};
}

/** Drops undefined members so the JSON is small and stable (it is also the de-duplication key). */
function compact<T extends Record<string, unknown>>(o: T): Partial<T> | undefined {
	const out = Object.fromEntries(
		Object.entries(o).filter(([, v]) => v !== undefined && v !== null)
	);
	return Object.keys(out).length ? (out as Partial<T>) : undefined;
}

export function checksBody(v: RecordValues, system: UnitSystem): Record<string, unknown> {
	const u = inUnits(system);
	return {
		process: v.process,
		...compact({
			currentType: v.currentType,
			transfer: v.transfer,
			amps: v.amps,
			volts: v.volts,
			travelSpeed: u.speed(v.travelSpeedMmPerS),
			wireFeed: u.speed(v.wireFeedMmPerS),
			thickness: u.length(v.thicknessMm),
			baseMetal: v.baseMetalSpec ? { spec: v.baseMetalSpec } : undefined,
			filler: compact({
				classification: v.fillerClass,
				diameter: u.length(v.fillerDiameterMm)
			}),
			tungsten: compact({
				classification: v.tungstenClass,
				diameter: u.length(v.tungstenDiameterMm)
			}),
			gas: compact({ name: v.gasName, flow: u.flow(v.gasFlowLPerMin) }),
			position: v.position,
			preheat: u.temperature(v.preheatC)
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
