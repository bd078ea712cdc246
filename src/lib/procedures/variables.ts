// The revision's variables document: an empty one, the editor's text to the document and back,
// and a draft whose ranges span a set of settings records. Pure, shared by server and browser.
import { parseBaseMetal, parseFiller, type UnitSystem } from '$lib/weld';
import type { RevisionForm, RevisionVariables, Range } from '$lib/schemas/procedure';
import { RANGE_FIELDS, SINGLE_FIELDS } from './fields';
import type { CodeId } from './options';
import { readQuantity, showQuantity } from './quantities';

const none = (): Range => ({ min: null, max: null });

export function emptyVariables(p: {
	title: string;
	code: CodeId;
	process: RevisionVariables['process'];
}): RevisionVariables {
	return {
		v: 1,
		title: p.title,
		code: p.code,
		codeEdition: '',
		scope: '',
		process: p.process,
		joints: { types: [], design: '', backing: '' },
		baseMetals: { specs: [], family: null, pNumbers: [], thicknessMm: none() },
		fillerMetals: { classifications: [], fNumbers: [], aNumbers: [], diameterMm: none() },
		positions: { allowed: [], progression: '' },
		preheat: { minC: null, interpassMaxC: null },
		pwht: { required: false, temperatureC: none(), notes: '' },
		gas: { shielding: '', flowLPerMin: none(), backing: '' },
		electrical: {
			currentType: null,
			transfer: null,
			amps: none(),
			volts: none(),
			wireFeedMmPerS: none(),
			tungstenClass: '',
			tungstenDiameterMm: none(),
			heatInputMaxJPerMm: null
		},
		technique: { travelSpeedMmPerS: none(), bead: '', passes: '', cleaning: '', notes: '' }
	};
}

type Groups = Record<string, Record<string, unknown>>;
const slot = (doc: RevisionVariables, group: string, key: string): unknown =>
	(doc as unknown as Groups)[group]?.[key];
const put = (doc: RevisionVariables, group: string, key: string, value: unknown) => {
	const g = (doc as unknown as Groups)[group];
	if (g) g[key] = value;
};

const uniq = <T>(xs: T[]): T[] => [...new Set(xs)];
const splitList = (s: string): string[] =>
	uniq(
		s
			.split(/[,;\n]/)
			.map((x) => x.trim())
			.filter(Boolean)
	).slice(0, 12);

/** P-Numbers, family and F/A-Numbers read from the specs and classifications typed. */
export function deriveGroupings(doc: RevisionVariables): RevisionVariables {
	const metals = doc.baseMetals.specs
		.map((s) => parseBaseMetal(s))
		.flatMap((r) => (r.ok ? [r.metal] : []));
	const fillers = doc.fillerMetals.classifications
		.map((c) => parseFiller(c))
		.flatMap((r) => (r.ok ? [r.filler] : []));
	return {
		...doc,
		baseMetals: {
			...doc.baseMetals,
			family: metals[0]?.family ?? doc.baseMetals.family,
			pNumbers: uniq(metals.flatMap((m) => (m.pNumber ? [m.pNumber] : [])))
		},
		fillerMetals: {
			...doc.fillerMetals,
			fNumbers: uniq(fillers.map((f) => f.fNumber)),
			aNumbers: uniq(fillers.flatMap((f) => (f.aNumber === null ? [] : [f.aNumber])))
		}
	};
}

/** The editor's text to the document (the schema has already checked every value reads). */
export function formToVariables(f: RevisionForm): RevisionVariables {
	const doc = emptyVariables({ title: f.title, code: f.code, process: f.process });
	const text = f as unknown as Record<string, string>;
	const read = (key: string, kind: Parameters<typeof readQuantity>[0]): number | null => {
		const raw = text[key] ?? '';
		if (raw === '') return null;
		const r = readQuantity(kind, raw, f.units);
		return r.ok ? r.value : null;
	};
	for (const [name, spec] of Object.entries(RANGE_FIELDS))
		put(doc, spec.group, spec.key, {
			min: read(`${name}Min`, spec.kind),
			max: read(`${name}Max`, spec.kind)
		});
	for (const [name, spec] of Object.entries(SINGLE_FIELDS))
		put(doc, spec.group, spec.key, read(name, spec.kind));
	doc.codeEdition = f.codeEdition;
	doc.scope = f.scope;
	doc.joints = {
		...doc.joints,
		types: uniq(f.jointTypes),
		design: f.jointDesign,
		backing: f.backing
	};
	doc.baseMetals.specs = splitList(f.baseMetalSpecs);
	doc.fillerMetals.classifications = splitList(f.fillerClasses).map((c) => c.toUpperCase());
	doc.positions = {
		allowed: uniq(f.positions),
		progression: f.progression as RevisionVariables['positions']['progression']
	};
	doc.pwht = { ...doc.pwht, required: f.pwhtRequired === 'yes', notes: f.pwhtNotes };
	doc.gas = { ...doc.gas, shielding: f.gasName, backing: f.backingGas };
	doc.electrical = {
		...doc.electrical,
		currentType: (f.currentType || null) as RevisionVariables['electrical']['currentType'],
		transfer: (f.process === 'GMAW'
			? f.transfer || null
			: null) as RevisionVariables['electrical']['transfer'],
		tungstenClass: f.process === 'GTAW' ? f.tungstenClass : ''
	};
	doc.technique = {
		...doc.technique,
		bead: f.bead as RevisionVariables['technique']['bead'],
		passes: f.passes as RevisionVariables['technique']['passes'],
		cleaning: f.cleaning,
		notes: f.techniqueNotes
	};
	return deriveGroupings(doc);
}

/** Record numbers typed in the editor ("12, #15") as ids. */
export const recordIdsFrom = (s: string): number[] =>
	uniq(
		s
			.split(/[\s,]+/)
			.map((x) => Number(x.replace('#', '')))
			.filter((n) => Number.isInteger(n) && n > 0)
	).slice(0, 50);

/** The document as the editor's text, in the reader's units. */
export function variablesToForm(
	doc: RevisionVariables,
	links: { pqrIds: number[]; recordIds: number[] },
	system: UnitSystem
): RevisionForm {
	const out: Record<string, unknown> = {
		units: system,
		title: doc.title,
		code: doc.code,
		codeEdition: doc.codeEdition,
		scope: doc.scope,
		process: doc.process,
		currentType: doc.electrical.currentType ?? '',
		transfer: doc.electrical.transfer ?? '',
		jointTypes: doc.joints.types,
		jointDesign: doc.joints.design,
		backing: doc.joints.backing,
		baseMetalSpecs: doc.baseMetals.specs.join(', '),
		fillerClasses: doc.fillerMetals.classifications.join(', '),
		tungstenClass: doc.electrical.tungstenClass,
		positions: doc.positions.allowed,
		progression: doc.positions.progression,
		gasName: doc.gas.shielding,
		backingGas: doc.gas.backing,
		pwhtRequired: doc.pwht.required ? 'yes' : 'no',
		pwhtNotes: doc.pwht.notes,
		bead: doc.technique.bead,
		passes: doc.technique.passes,
		cleaning: doc.technique.cleaning,
		techniqueNotes: doc.technique.notes,
		pqrIds: links.pqrIds,
		recordIds: links.recordIds.join(', ')
	};
	const show = (v: unknown, kind: Parameters<typeof showQuantity>[0]) =>
		typeof v === 'number' ? showQuantity(kind, v, system) : '';
	for (const [name, spec] of Object.entries(RANGE_FIELDS)) {
		const r = slot(doc, spec.group, spec.key) as Range | undefined;
		out[`${name}Min`] = show(r?.min, spec.kind);
		out[`${name}Max`] = show(r?.max, spec.kind);
	}
	for (const [name, spec] of Object.entries(SINGLE_FIELDS))
		out[name] = show(slot(doc, spec.group, spec.key), spec.kind);
	return out as unknown as RevisionForm;
}

export { slot };
