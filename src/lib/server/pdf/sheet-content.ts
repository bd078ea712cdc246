// What a procedure sheet says, before any drawing: the values at the arc in large type, every
// variable by group in the shop's units with the other system beside it, the sign-off lines and
// the safety lines. Pure, so tests and the booth view can read the same words.
import { groupsOf } from '$lib/procedures/display';
import { STATE_LABELS, type RevisionStateId } from '$lib/procedures/options';
import type { RevisionVariables } from '$lib/schemas/procedure';
import {
	ADVISORY_NOTE,
	cautionsFor,
	SAFE_PRACTICE,
	shadeForRange,
	type Caution,
	type ShadeAdvice
} from '$lib/safety/cautions';
import type { UnitSystem } from '$lib/weld';

export interface SheetSignOff {
	printedName: string;
	role: string;
	meaning: string;
	signedAt: Date;
	digest: string;
}

export interface SheetInput {
	shopName: string;
	number: string;
	rev: number;
	state: RevisionStateId;
	supersededByRev: number | null;
	variables: RevisionVariables;
	/** The shop's unit system; the other one is printed small beside each quantity. */
	units: UnitSystem;
	pqrs: { number: string; title: string }[];
	signOff: SheetSignOff | null;
	/** False when the stored revision no longer matches its signature (printed as a stop). */
	intact: boolean;
	/** The revision's booth link; the QR code encodes exactly this. */
	url: string;
	printedAt: Date;
	paper: 'a4' | 'letter';
}

export interface Value {
	key?: string;
	label: string;
	value: string;
	/** The same value in the other unit system, when it reads differently. */
	other: string | null;
}

export interface ValueGroup {
	title: string;
	rows: Value[];
}

/** "2025-03-04 14:05 UTC": the sign-off and print times, always UTC. */
export const utcText = (d: Date): string => `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`;

/** The first 16 hex digits in groups of four: enough to compare by eye with the screen. */
export const shortDigest = (hex: string): string =>
	`${(hex.slice(0, 16).match(/.{1,4}/g) ?? []).join(' ')} …`;

export const UNCONTROLLED = 'Uncontrolled when printed: scan to check the current revision.';

/** The state as the badge prints it. */
export const stateBadge = (s: Pick<SheetInput, 'state'>): string =>
	STATE_LABELS[s.state].toUpperCase();

/** The full-width warning of a sheet nobody may weld to, or null for the revision in force. */
export function stopLine(
	s: Pick<SheetInput, 'state' | 'supersededByRev' | 'intact'>
): string | null {
	if (s.state === 'superseded')
		return `SUPERSEDED${s.supersededByRev ? ` by revision ${s.supersededByRev}` : ''}: do not weld to this sheet.`;
	if (s.state === 'withdrawn') return 'WITHDRAWN: do not weld to this sheet.';
	if (s.state !== 'approved') return 'NOT APPROVED: do not weld to this sheet.';
	if (!s.intact) return 'DO NOT USE: the stored revision no longer matches its signature.';
	return null;
}

const other = (u: UnitSystem): UnitSystem => (u === 'imperial' ? 'metric' : 'imperial');

/** "3/32–3/32 in" reads "3/32 in": a range whose ends are equal is one value. */
export const oneValue = (t: string): string => t.replace(/^([^–]+)–\1(\s.*)?$/, '$1$2');

/** Every variable that is set, by group, in the shop's system and the other one. */
export function valueGroups(v: RevisionVariables, units: UnitSystem): ValueGroup[] {
	const alt = groupsOf(v, other(units));
	return groupsOf(v, units)
		.map((g, i) => ({
			title: g.title,
			rows: g.rows
				.map((r, j) => {
					const value = oneValue(r.value);
					const o = oneValue(alt[i]?.rows[j]?.value ?? '');
					return { key: r.key, label: r.label, value, other: o && o !== value ? o : null };
				})
				.filter((r) => r.value !== '')
		}))
		.filter((g) => g.rows.length > 0);
}

export function sheetShade(v: RevisionVariables): ShadeAdvice | null {
	return shadeForRange(v.process, v.electrical.amps);
}

export const shadeText = (s: ShadeAdvice | null): string =>
	s
		? `Lens shade at least ${s.minimum}${s.suggested ? `, suggested ${s.suggested}` : ''}`
		: 'Lens shade: set it for the current (OSHA 29 CFR 1910.133(a)(5))';

/** The rows the top of the sheet shows in large type, by the display's row keys. */
const ARC: [string, string[]][] = [
	['Process and current', ['process', 'currentType']],
	['Amperage', ['amps']],
	['Voltage', ['volts']],
	['Wire feed speed', ['wireFeed']],
	['Tungsten', ['tungstenClass', 'tungstenDiameter']],
	['Travel speed', ['travelSpeed']],
	['Filler', ['fillerClasses', 'fillerDiameter']],
	['Shielding gas', ['gasName', 'gasFlow']],
	['Positions', ['positions', 'progression']],
	['Minimum preheat', ['preheat']]
];
export const ARC_KEYS: ReadonlySet<string> = new Set(ARC.flatMap(([, keys]) => keys));

/** The values a welder reads at the arc, in large type at the top of the sheet. */
export function atTheArc(v: RevisionVariables, units: UnitSystem): Value[] {
	const byKey = new Map<string, Value>();
	for (const g of valueGroups(v, units)) for (const r of g.rows) byKey.set(r.key ?? '', r);
	const out: Value[] = [];
	for (const [label, keys] of ARC) {
		const set = keys.map((k) => byKey.get(k)).filter((p): p is Value => !!p);
		if (!set.length) continue;
		out.push({
			label,
			value: set.map((p) => p.value).join(' · '),
			other: set.some((p) => p.other) ? set.map((p) => p.other ?? p.value).join(' · ') : null
		});
	}
	const shade = sheetShade(v);
	if (shade)
		out.push({
			key: 'shade',
			label: 'Lens shade, at least',
			value: `${shade.minimum}${shade.suggested ? ` (${shade.suggested} suggested)` : ''}`,
			other: null
		});
	return out;
}

export interface SafetyText {
	shade: string;
	cautions: Caution[];
	practice: string;
	advisory: string;
}

export function safetyText(v: RevisionVariables): SafetyText {
	const shade = sheetShade(v);
	return {
		shade: shadeText(shade),
		cautions: cautionsFor({
			process: v.process,
			family: v.baseMetals.family,
			tungsten: v.electrical.tungstenClass,
			shade
		}),
		practice: SAFE_PRACTICE,
		advisory: ADVISORY_NOTE
	};
}

/** The sign-off block as label/value pairs. */
export function signOffLines(s: SheetSignOff): [string, string][] {
	return [
		['Printed name', s.printedName],
		['Role', s.role],
		['Meaning', s.meaning === 'approved' ? 'Approved' : s.meaning],
		['Signed (UTC)', utcText(s.signedAt)],
		['Digest (SHA-256)', shortDigest(s.digest)]
	];
}
