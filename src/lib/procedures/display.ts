// A revision's variables as people read them: groups of labelled rows in the reader's units.
// Shared by the revision page, the review desk, the diff and the trail's before/after.
import { rangeText, type UnitSystem } from '$lib/weld';
import {
	FAMILY_LABELS,
	JOINT_LABELS,
	PROCESS_LABELS,
	TRANSFER_LABELS,
	type JointType,
	type MetalFamilyChoice
} from '$lib/records/options';
import type { Range, RevisionVariables } from '$lib/schemas/procedure';
import { BEAD_LABELS, CODE_LABELS, PASS_LABELS } from './options';
import { showQuantity, type QuantityKind } from './quantities';

export interface Row {
	key: string;
	label: string;
	value: string;
}
export interface Group {
	id: string;
	title: string;
	rows: Row[];
}

export function rangeValue(r: Range, kind: QuantityKind, system: UnitSystem): string {
	const show = (v: number | null) => (v === null ? null : showQuantity(kind, v, system));
	return r.min === null && r.max === null ? '' : rangeText(show(r.min), show(r.max));
}

const list = (xs: readonly (string | number)[], fmt: (x: string) => string = (x) => x) =>
	xs.map((x) => fmt(String(x))).join(', ');

/** Rows that belong to one process only: left out, when empty, for every other process. */
const ONLY_FOR: Readonly<Record<string, RevisionVariables['process']>> = {
	tungstenClass: 'GTAW',
	tungstenDiameter: 'GTAW'
};

/**
 * The variables in their groups. An empty row for another process (no tungsten on GMAW) is left
 * out, unless `everyRow` asks for the full list (a diff pairs rows by position).
 */
export function groupsOf(v: RevisionVariables, system: UnitSystem, everyRow = false): Group[] {
	const one = (x: number | null, kind: QuantityKind) =>
		x === null ? '' : showQuantity(kind, x, system);
	const e = v.electrical;
	const g = (id: string, title: string, rows: [string, string, string][]): Group => ({
		id,
		title,
		rows: rows
			.filter(
				([key, , value]) => everyRow || value !== '' || (ONLY_FOR[key] ?? v.process) === v.process
			)
			.map(([key, label, value]) => ({ key, label, value }))
	});
	return [
		g('scope', 'Scope and code', [
			['title', 'Title', v.title],
			['code', 'Code', CODE_LABELS[v.code]],
			['codeEdition', 'Edition', v.codeEdition],
			['scope', 'Scope', v.scope]
		]),
		g('electrical', 'Process and electrical characteristics', [
			['process', 'Process', PROCESS_LABELS[v.process]],
			['currentType', 'Current and polarity', e.currentType ?? ''],
			['transfer', 'Transfer mode', e.transfer ? TRANSFER_LABELS[e.transfer] : ''],
			['amps', 'Amperage', rangeValue(e.amps, 'amps', system)],
			['volts', 'Voltage', rangeValue(e.volts, 'volts', system)],
			['wireFeed', 'Wire feed speed', rangeValue(e.wireFeedMmPerS, 'wire', system)],
			['tungstenClass', 'Tungsten', e.tungstenClass],
			[
				'tungstenDiameter',
				'Tungsten diameter',
				rangeValue(e.tungstenDiameterMm, 'diameter', system)
			],
			['heatInput', 'Maximum heat input', one(e.heatInputMaxJPerMm, 'heatInput')]
		]),
		g('joints', 'Joints', [
			['jointTypes', 'Joint types', list(v.joints.types, (j) => JOINT_LABELS[j as JointType] ?? j)],
			['jointDesign', 'Design', v.joints.design],
			['backing', 'Backing', v.joints.backing]
		]),
		g('baseMetals', 'Base metals', [
			['baseMetalSpecs', 'Specifications', list(v.baseMetals.specs)],
			[
				'family',
				'Material',
				v.baseMetals.family ? (FAMILY_LABELS[v.baseMetals.family as MetalFamilyChoice] ?? '') : ''
			],
			['pNumbers', 'P-Numbers', list(v.baseMetals.pNumbers, (p) => `P-${p}`)],
			['thickness', 'Thickness', rangeValue(v.baseMetals.thicknessMm, 'thickness', system)]
		]),
		g('fillerMetals', 'Filler metals', [
			['fillerClasses', 'Classifications', list(v.fillerMetals.classifications)],
			['fNumbers', 'F-Numbers', list(v.fillerMetals.fNumbers, (f) => `F-${f}`)],
			['aNumbers', 'A-Numbers', list(v.fillerMetals.aNumbers, (a) => `A-${a}`)],
			['fillerDiameter', 'Diameter', rangeValue(v.fillerMetals.diameterMm, 'diameter', system)]
		]),
		g('positions', 'Positions', [
			['positions', 'Positions', list(v.positions.allowed)],
			['progression', 'Vertical progression', v.positions.progression]
		]),
		g('preheat', 'Preheat and interpass', [
			['preheat', 'Minimum preheat', one(v.preheat.minC, 'temperature')],
			['interpass', 'Maximum interpass', one(v.preheat.interpassMaxC, 'temperature')]
		]),
		g('pwht', 'Post-weld heat treatment', [
			['pwht', 'PWHT', v.pwht.required ? 'Required' : 'None'],
			['pwhtTemp', 'Temperature', rangeValue(v.pwht.temperatureC, 'temperature', system)],
			['pwhtNotes', 'Notes', v.pwht.notes]
		]),
		g('gas', 'Shielding and backing gas', [
			['gasName', 'Shielding gas', v.gas.shielding],
			['gasFlow', 'Flow', rangeValue(v.gas.flowLPerMin, 'flow', system)],
			['backingGas', 'Backing gas', v.gas.backing]
		]),
		g('technique', 'Technique', [
			['travelSpeed', 'Travel speed', rangeValue(v.technique.travelSpeedMmPerS, 'travel', system)],
			['bead', 'Bead', v.technique.bead ? BEAD_LABELS[v.technique.bead] : ''],
			['passes', 'Passes', v.technique.passes ? PASS_LABELS[v.technique.passes] : ''],
			['cleaning', 'Cleaning', v.technique.cleaning],
			['techniqueNotes', 'Notes', v.technique.notes]
		])
	];
}

/** Every row of both documents by key, for a diff; `changed` marks the rows that differ. */
export function diffRows(
	a: RevisionVariables,
	b: RevisionVariables,
	system: UnitSystem
): { group: string; key: string; label: string; a: string; b: string; changed: boolean }[] {
	const ga = groupsOf(a, system, true);
	const gb = groupsOf(b, system, true);
	// Rows pair by position, so both sides list every row; a row of another process that both
	// leave empty (tungsten on two GMAW revisions) is then dropped.
	const foreign = (key: string) => {
		const only = ONLY_FOR[key];
		return only !== undefined && only !== a.process && only !== b.process;
	};
	return ga.flatMap((group, i) =>
		group.rows
			.map((row, j) => {
				const other = gb[i]?.rows[j]?.value ?? '';
				return {
					group: group.title,
					key: row.key,
					label: row.label,
					a: row.value,
					b: other,
					changed: row.value !== other
				};
			})
			.filter((r) => r.a !== '' || r.b !== '' || !foreign(r.key))
	);
}
