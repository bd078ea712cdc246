// The choices the settings record form offers, shared by the form, the filters and the schema.
import type { CurrentType, Process, Transfer } from '$lib/weld';

export const PROCESSES = ['GTAW', 'GMAW', 'FCAW', 'SMAW'] as const satisfies readonly Process[];
export const CURRENT_TYPES = ['DCEN', 'DCEP', 'AC'] as const satisfies readonly CurrentType[];
export const TRANSFERS = [
	'short-circuit',
	'globular',
	'spray',
	'pulsed-spray'
] as const satisfies readonly Transfer[];
export const JOINT_TYPES = ['butt', 'tee', 'lap', 'corner', 'edge', 'pipe'] as const;
export const POSITIONS = ['1G', '2G', '3G', '4G', '5G', '6G', '1F', '2F', '3F', '4F'] as const;
export const OUTCOME_KINDS = ['sound', 'rework', 'rejected', 'other'] as const;
export const METAL_FAMILIES = ['carbon-steel', 'low-alloy', 'stainless', 'aluminium'] as const;

export type JointType = (typeof JOINT_TYPES)[number];
export type Position = (typeof POSITIONS)[number];
export type OutcomeKind = (typeof OUTCOME_KINDS)[number];
export type MetalFamilyChoice = (typeof METAL_FAMILIES)[number];

export const PROCESS_LABELS: Record<Process, string> = {
	GTAW: 'GTAW (TIG)',
	GMAW: 'GMAW (MIG/MAG)',
	FCAW: 'FCAW (flux-cored)',
	SMAW: 'SMAW (stick)'
};
export const TRANSFER_LABELS: Record<Transfer, string> = {
	'short-circuit': 'Short-circuit',
	globular: 'Globular',
	spray: 'Spray',
	'pulsed-spray': 'Pulsed spray'
};
export const JOINT_LABELS: Record<JointType, string> = {
	butt: 'Butt (groove)',
	tee: 'T-joint',
	lap: 'Lap',
	corner: 'Corner',
	edge: 'Edge',
	pipe: 'Pipe butt'
};
export const OUTCOME_LABELS: Record<OutcomeKind, string> = {
	sound: 'Sound',
	rework: 'Needs rework',
	rejected: 'Rejected',
	other: 'Other'
};
export const FAMILY_LABELS: Record<MetalFamilyChoice, string> = {
	'carbon-steel': 'Carbon steel',
	'low-alloy': 'Low-alloy steel',
	stainless: 'Stainless',
	aluminium: 'Aluminium'
};

/** Words people type for the outcome; the form offers them and the kind is read from them. */
export const OUTCOME_SUGGESTIONS = ['sound', 'needs rework', 'rejected'] as const;

/** The outcome in the engineer's own words, sorted into a kind for colours and filters. */
export function outcomeKind(text: string | null | undefined): OutcomeKind {
	const s = (text ?? '').toLowerCase();
	if (/reject|fail|scrap|crack/.test(s)) return 'rejected';
	if (/rework|repair|redo|needs|grind out|marginal/.test(s)) return 'rework';
	if (/sound|good|pass|ok\b|accept|fine/.test(s)) return 'sound';
	return 'other';
}

/** Which fields apply to which process; the form hides the rest and the server ignores them. */
export const APPLIES: Record<'transfer' | 'wireFeed' | 'tungsten' | 'gas', readonly Process[]> = {
	transfer: ['GMAW'],
	wireFeed: ['GMAW', 'FCAW'],
	tungsten: ['GTAW'],
	gas: ['GTAW', 'GMAW', 'FCAW']
};

export const applies = (what: keyof typeof APPLIES, process: Process): boolean =>
	APPLIES[what].includes(process);

export const opts = <T extends string>(values: readonly T[], labels?: Record<T, string>) =>
	values.map((v) => ({ value: v, label: labels?.[v] ?? v }));
