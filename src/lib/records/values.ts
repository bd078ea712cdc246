// From the form's text to SI values (and back). Pure: the server stores what this returns and
// the browser builds its live-check request from it, so both read "3/32" the same way.
import {
	parseBaseMetal,
	parseFlow,
	parseLength,
	parseSpeed,
	parseTemperature,
	type MetalFamily,
	type Parsed,
	type Process,
	type UnitSystem,
	type WeldSettings
} from '$lib/weld';
import { applies, outcomeKind, type OutcomeKind } from './options';

/** The quantity fields typed as text, and what each one holds. */
export const QUANTITY_FIELDS = {
	amps: 'amps',
	volts: 'volts',
	wireFeed: 'speed',
	travelSpeed: 'speed',
	fillerDiameter: 'diameter',
	tungstenDiameter: 'diameter',
	gasFlow: 'flow',
	thickness: 'thickness',
	preheat: 'temperature',
	interpass: 'temperature'
} as const;
export type QuantityField = keyof typeof QUANTITY_FIELDS;

type Result = { ok: true; value: number } | { ok: false; message: string };

function readPlain(text: string, unit: 'a' | 'v', min: number, max: number, what: string): Result {
	const m = new RegExp(`^(\\d+(?:[.,]\\d+)?)\\s*${unit}?$`, 'i').exec(text.trim());
	const n = m?.[1] ? Number(m[1].replace(',', '.')) : NaN;
	if (!Number.isFinite(n)) return { ok: false, message: `Enter the ${what} as a number.` };
	if (n < min || n > max) return { ok: false, message: `Enter ${what} between ${min} and ${max}.` };
	return { ok: true, value: n };
}

const gaugeTable = (family: MetalFamily | undefined) =>
	family === 'aluminium' ? 'aluminium' : family === 'stainless' ? 'stainless' : 'sheet-steel';

/** Reads one quantity field; bare numbers take the units of the given system. */
export function readQuantity(
	field: QuantityField,
	text: string,
	system: UnitSystem,
	family?: MetalFamily
): Result {
	const metric = system === 'metric';
	const wrap = <K extends string>(r: Parsed<K>, key: K): Result =>
		r.ok ? { ok: true, value: r[key] } : r;
	switch (QUANTITY_FIELDS[field]) {
		case 'amps':
			return readPlain(text, 'a', 1, 1000, 'amps');
		case 'volts':
			return readPlain(text, 'v', 1, 80, 'volts');
		case 'speed':
			return wrap(parseSpeed(text, metric ? 'mm/min' : 'in/min'), 'mmPerS');
		case 'diameter':
			return wrap(parseLength(text, metric ? 'mm' : 'in', { maxMm: 13 }), 'mm');
		case 'thickness':
			return wrap(parseLength(text, metric ? 'mm' : 'in', { gauge: gaugeTable(family) }), 'mm');
		case 'flow':
			return wrap(parseFlow(text, metric ? 'L/min' : 'CFH'), 'lPerMin');
		case 'temperature':
			return wrap(parseTemperature(text, metric ? 'degC' : 'degF'), 'degC');
	}
}

/** What the form holds, as text (the schema's output). */
export interface RecordText {
	units: UnitSystem;
	process: Process;
	currentType: string;
	transfer: string;
	amps: string;
	volts: string;
	wireFeed: string;
	travelSpeed: string;
	fillerClass: string;
	fillerDiameter: string;
	tungstenClass: string;
	tungstenDiameter: string;
	gasName: string;
	gasFlow: string;
	baseMetalSpec: string;
	thickness: string;
	jointType: string;
	position: string;
	preheat: string;
	interpass: string;
	machine: string;
	jobRef: string;
	outcome: string;
	defects: string;
	notes: string;
	weldedOn: string;
}

/** The record in SI, as stored: null where nothing (or nothing readable) was given. */
export interface RecordValues {
	process: Process;
	currentType: string | null;
	transfer: string | null;
	amps: number | null;
	volts: number | null;
	wireFeedMmPerS: number | null;
	travelSpeedMmPerS: number | null;
	fillerClass: string | null;
	fillerDiameterMm: number | null;
	tungstenClass: string | null;
	tungstenDiameterMm: number | null;
	gasName: string | null;
	gasFlowLPerMin: number | null;
	baseMetalSpec: string | null;
	baseMetalFamily: MetalFamily | null;
	pNumber: string | null;
	thicknessMm: number | null;
	jointType: string | null;
	position: string | null;
	preheatC: number | null;
	interpassC: number | null;
	machine: string | null;
	jobRef: string | null;
	outcome: string | null;
	outcomeKind: OutcomeKind | null;
	defects: string | null;
	notes: string | null;
	weldedOn: string;
	/** The text typed for each quantity, so an edit shows "3/32" again rather than 0.094. */
	entered: Partial<Record<QuantityField, string>>;
}

const orNull = (s: string | undefined): string | null => (s && s.trim() !== '' ? s.trim() : null);

export function baseMetalOf(spec: string): {
	family: MetalFamily | null;
	pNumber: string | null;
	group: number | null;
} {
	const r = spec.trim() ? parseBaseMetal(spec) : null;
	return r?.ok
		? { family: r.metal.family, pNumber: r.metal.pNumber, group: r.metal.group }
		: { family: null, pNumber: null, group: null };
}

/** Converts the form's text; fields that do not apply to the process are left out. */
export function recordValues(t: RecordText): RecordValues {
	const p = t.process;
	const metal = baseMetalOf(t.baseMetalSpec);
	const entered: RecordValues['entered'] = {};
	const q = (field: QuantityField, keep = true): number | null => {
		const text = t[field].trim();
		if (!keep || text === '') return null;
		const r = readQuantity(field, text, t.units, metal.family ?? undefined);
		if (!r.ok) return null;
		entered[field] = text;
		return r.value;
	};
	const gas = applies('gas', p);
	const tungsten = applies('tungsten', p);
	return {
		process: p,
		currentType: orNull(t.currentType),
		transfer: applies('transfer', p) ? orNull(t.transfer) : null,
		amps: q('amps'),
		volts: q('volts'),
		wireFeedMmPerS: q('wireFeed', applies('wireFeed', p)),
		travelSpeedMmPerS: q('travelSpeed'),
		fillerClass: orNull(t.fillerClass)?.toUpperCase() ?? null,
		fillerDiameterMm: q('fillerDiameter'),
		tungstenClass: tungsten ? orNull(t.tungstenClass) : null,
		tungstenDiameterMm: q('tungstenDiameter', tungsten),
		gasName: gas ? orNull(t.gasName) : null,
		gasFlowLPerMin: q('gasFlow', gas),
		baseMetalSpec: orNull(t.baseMetalSpec),
		baseMetalFamily: metal.family,
		pNumber: metal.pNumber,
		thicknessMm: q('thickness'),
		jointType: orNull(t.jointType),
		position: orNull(t.position),
		preheatC: q('preheat'),
		interpassC: q('interpass'),
		machine: orNull(t.machine),
		jobRef: orNull(t.jobRef),
		outcome: orNull(t.outcome),
		outcomeKind: orNull(t.outcome) ? outcomeKind(t.outcome) : null,
		defects: orNull(t.defects),
		notes: orNull(t.notes),
		weldedOn: t.weldedOn,
		entered
	};
}

const opt = <T>(v: T | null): T | undefined => (v === null ? undefined : v);

/** The weld core's input for a stored or converted record. */
export function weldSettings(v: RecordValues): WeldSettings {
	return {
		process: v.process,
		currentType: opt(v.currentType) as WeldSettings['currentType'],
		transfer: opt(v.transfer) as WeldSettings['transfer'],
		amps: opt(v.amps),
		volts: opt(v.volts),
		travelSpeedMmPerS: opt(v.travelSpeedMmPerS),
		wireFeedMmPerS: opt(v.wireFeedMmPerS),
		thicknessMm: opt(v.thicknessMm),
		baseMetal: v.baseMetalSpec ? { spec: v.baseMetalSpec } : undefined,
		filler:
			v.fillerClass || v.fillerDiameterMm
				? { classification: opt(v.fillerClass), diameterMm: opt(v.fillerDiameterMm) }
				: undefined,
		tungsten:
			v.tungstenClass || v.tungstenDiameterMm
				? { classification: opt(v.tungstenClass), diameterMm: opt(v.tungstenDiameterMm) }
				: undefined,
		gas:
			v.gasName || v.gasFlowLPerMin
				? { name: opt(v.gasName), flowLPerMin: opt(v.gasFlowLPerMin) }
				: undefined,
		position: opt(v.position),
		preheatC: opt(v.preheatC)
	};
}
