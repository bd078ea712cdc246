// A stored record's values as people read them, in the reader's units. Shared by the detail
// page, compare, the CSV export and the edit form's prefill.
import {
	formatFlow,
	formatLength,
	formatSpeed,
	formatTemperature,
	inchFraction,
	mmPerSToSpeed,
	mmToIn,
	cToF,
	lPerMinToFlow,
	type UnitSystem
} from '$lib/weld';
import {
	FAMILY_LABELS,
	JOINT_LABELS,
	OUTCOME_LABELS,
	PROCESS_LABELS,
	TRANSFER_LABELS,
	type JointType,
	type MetalFamilyChoice,
	type OutcomeKind
} from './options';
import type { QuantityField, RecordText } from './values';

/** The stored columns these helpers read (a model instance or its JSON). */
export interface StoredValues {
	process: string;
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
	baseMetalFamily: string | null;
	pNumber: string | null;
	thicknessMm: number | null;
	jointType: string | null;
	position: string | null;
	preheatC: number | null;
	interpassC: number | null;
	machine: string | null;
	jobRef: string | null;
	outcome: string | null;
	outcomeKind: string | null;
	defects: string | null;
	notes: string | null;
	weldedOn: string;
}

const n = (v: number | null, f: (x: number) => string): string => (v === null ? '' : f(v));
const amps = (v: number) => `${Math.round(v * 10) / 10} A`;
const volts = (v: number) => `${Math.round(v * 10) / 10} V`;

export interface DisplayRow {
	key: string;
	label: string;
	value: string;
}

/** Every value in reading order, formatted; empty strings where nothing was recorded. */
export function displayRows(r: StoredValues, system: UnitSystem): DisplayRow[] {
	const len = (v: number) => formatLength(v, system);
	const family = r.baseMetalFamily as MetalFamilyChoice | null;
	const rows: [string, string, string][] = [
		['process', 'Process', PROCESS_LABELS[r.process as keyof typeof PROCESS_LABELS] ?? r.process],
		['currentType', 'Current and polarity', r.currentType ?? ''],
		[
			'transfer',
			'Transfer mode',
			r.transfer ? (TRANSFER_LABELS[r.transfer as keyof typeof TRANSFER_LABELS] ?? r.transfer) : ''
		],
		['amps', 'Amperage', n(r.amps, amps)],
		['volts', 'Voltage', n(r.volts, volts)],
		['wireFeed', 'Wire feed speed', n(r.wireFeedMmPerS, (v) => formatSpeed(v, system, 'wire'))],
		['travelSpeed', 'Travel speed', n(r.travelSpeedMmPerS, (v) => formatSpeed(v, system))],
		['fillerClass', 'Filler', r.fillerClass ?? ''],
		['fillerDiameter', 'Filler diameter', n(r.fillerDiameterMm, len)],
		['tungstenClass', 'Tungsten', r.tungstenClass ?? ''],
		['tungstenDiameter', 'Tungsten diameter', n(r.tungstenDiameterMm, len)],
		['gasName', 'Shielding gas', r.gasName ?? ''],
		['gasFlow', 'Gas flow', n(r.gasFlowLPerMin, (v) => formatFlow(v, system))],
		['baseMetalSpec', 'Base metal', r.baseMetalSpec ?? ''],
		['baseMetalFamily', 'Material', family ? (FAMILY_LABELS[family] ?? family) : ''],
		['pNumber', 'P-Number', r.pNumber ? `P-${r.pNumber}` : ''],
		['thickness', 'Thickness', n(r.thicknessMm, len)],
		[
			'jointType',
			'Joint',
			r.jointType ? (JOINT_LABELS[r.jointType as JointType] ?? r.jointType) : ''
		],
		['position', 'Position', r.position ?? ''],
		['preheat', 'Preheat', n(r.preheatC, (v) => formatTemperature(v, system))],
		['interpass', 'Interpass', n(r.interpassC, (v) => formatTemperature(v, system))],
		['machine', 'Machine', r.machine ?? ''],
		['jobRef', 'Job or part', r.jobRef ?? ''],
		['outcome', 'Outcome', r.outcome ?? ''],
		['defects', 'Defects seen', r.defects ?? ''],
		['notes', 'Notes', r.notes ?? ''],
		['weldedOn', 'Date welded', r.weldedOn]
	];
	return rows.map(([key, label, value]) => ({ key, label, value }));
}

export const outcomeLabel = (kind: string | null): string =>
	kind ? (OUTCOME_LABELS[kind as OutcomeKind] ?? kind) : '';

/** Plain numbers in the reader's units for spreadsheets (no fractions, no unit text). */
export function numericIn(system: UnitSystem) {
	const round = (v: number, places: number) => Math.round(v * 10 ** places) / 10 ** places;
	const imperial = system === 'imperial';
	return {
		length: (mm: number | null) =>
			mm === null ? '' : String(imperial ? round(mmToIn(mm), 4) : round(mm, 2)),
		speed: (mmPerS: number | null) =>
			mmPerS === null
				? ''
				: String(round(mmPerSToSpeed(mmPerS, imperial ? 'in/min' : 'mm/min'), 1)),
		flow: (l: number | null) =>
			l === null ? '' : String(round(imperial ? lPerMinToFlow(l, 'CFH') : l, 1)),
		temperature: (c: number | null) =>
			c === null ? '' : String(Math.round(imperial ? cToF(c) : c)),
		units: imperial
			? { length: 'in', speed: 'in/min', flow: 'CFH', temperature: '°F' }
			: { length: 'mm', speed: 'mm/min', flow: 'L/min', temperature: '°C' }
	};
}

/** Text for an edit form: what was typed when the units match, else the value with its unit. */
export function recordTextOf(
	r: StoredValues,
	entered: { units?: UnitSystem; fields?: Partial<Record<QuantityField, string>> },
	system: UnitSystem
): RecordText {
	const typed = entered.units === system ? (entered.fields ?? {}) : {};
	const len = (v: number | null) => {
		if (v === null) return '';
		if (system === 'metric') return formatLength(v, 'metric');
		const f = inchFraction(mmToIn(v));
		return f ? `${f} in` : formatLength(v, 'imperial');
	};
	const pick = (field: QuantityField, fallback: string) => typed[field] ?? fallback;
	const speedText = (v: number | null, kind: 'travel' | 'wire') =>
		v === null ? '' : formatSpeed(v, system, kind);
	return {
		units: system,
		process: r.process as RecordText['process'],
		currentType: r.currentType ?? '',
		transfer: r.transfer ?? '',
		amps: pick('amps', r.amps === null ? '' : String(r.amps)),
		volts: pick('volts', r.volts === null ? '' : String(r.volts)),
		wireFeed: pick('wireFeed', speedText(r.wireFeedMmPerS, 'wire')),
		travelSpeed: pick('travelSpeed', speedText(r.travelSpeedMmPerS, 'travel')),
		fillerClass: r.fillerClass ?? '',
		fillerDiameter: pick('fillerDiameter', len(r.fillerDiameterMm)),
		tungstenClass: r.tungstenClass ?? '',
		tungstenDiameter: pick('tungstenDiameter', len(r.tungstenDiameterMm)),
		gasName: r.gasName ?? '',
		gasFlow: pick('gasFlow', r.gasFlowLPerMin === null ? '' : formatFlow(r.gasFlowLPerMin, system)),
		baseMetalSpec: r.baseMetalSpec ?? '',
		thickness: pick('thickness', len(r.thicknessMm)),
		jointType: r.jointType ?? '',
		position: r.position ?? '',
		preheat: pick('preheat', r.preheatC === null ? '' : formatTemperature(r.preheatC, system)),
		interpass: pick(
			'interpass',
			r.interpassC === null ? '' : formatTemperature(r.interpassC, system)
		),
		machine: r.machine ?? '',
		jobRef: r.jobRef ?? '',
		outcome: r.outcome ?? '',
		defects: r.defects ?? '',
		notes: r.notes ?? '',
		weldedOn: r.weldedOn
	};
}
