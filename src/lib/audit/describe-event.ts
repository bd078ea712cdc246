// An audit event as a sentence in the shop's words: "Reuben Castell changed amperage, low end:
// 110 A → 115 A", with each changed value labelled and in the reader's units, and the moment in
// words. The raw entry (codes, paths, stored values) stays as it is for the auditor and the
// export; this is only how a page reads it. Pure and framework-free: the server calls it in loads.
import { actionWords } from './action-labels';
import { momentText, valueText, type Reading } from './audit-values';
import { fieldOf, inSentence } from './field-labels';

export type { Reading } from './audit-values';

export interface AuditEventInput {
	actor: string;
	action: string;
	at: string | Date;
	/** The stored before and after, parsed (objects, arrays, scalars; undefined when absent). */
	before?: unknown;
	after?: unknown;
}

export interface ChangeInWords {
	path: string;
	label: string;
	before: string;
	after: string;
	/** "amperage, low end: 110 A → 115 A", or "amperage: 110 A" for a value only set. */
	line: string;
}

export interface EventInWords {
	label: string;
	sentence: string;
	at: { iso: string; text: string };
	changes: ChangeInWords[];
}

const NONE = '—';

/** Leaf values by dotted path, kept as they are (a boolean stays a boolean); arrays of scalars are one leaf. */
export function leaves(v: unknown, prefix = '', out = new Map<string, unknown>()) {
	if (v === undefined) return out;
	const scalarList = Array.isArray(v) && v.every((x) => x === null || typeof x !== 'object');
	if (v !== null && typeof v === 'object' && !scalarList) {
		for (const [k, x] of Object.entries(v as Record<string, unknown>))
			leaves(x, prefix ? `${prefix}.${k}` : k, out);
		return out;
	}
	out.set(prefix || 'value', v);
	return out;
}

const json = (v: unknown): string => {
	try {
		return JSON.stringify(v ?? null) ?? String(v);
	} catch {
		return String(typeof v); // a value JSON cannot hold (a bigint, a cycle): compared by kind
	}
};
const same = (a: unknown, b: unknown) => json(a) === json(b);

/** The values that differ between before and after, in words (every value set, for a creation). */
export function changesInWords(before: unknown, after: unknown, reading: Reading): ChangeInWords[] {
	const a = leaves(before);
	const b = leaves(after);
	const paths = [...new Set([...a.keys(), ...b.keys()])].filter((p) => !same(a.get(p), b.get(p)));
	return paths.flatMap((path) => {
		const field = fieldOf(path);
		if (field.internal) return [];
		const was = valueText(a.get(path), field.value, reading);
		const now = valueText(b.get(path), field.value, reading);
		const only = !a.has(path);
		const line = `${inSentence(field.label)}: ${only ? now : `${was} → ${now}`}`;
		return [{ path, label: field.label, before: only ? '' : was, after: now, line }];
	});
}

/** Text of a stored scalar; an object whose toString is broken reads as its kind. */
function text(v: unknown): string {
	try {
		return v === null || v === undefined ? '' : String(v);
	} catch {
		return typeof v;
	}
}

const isIso = (s: string) => !Number.isNaN(new Date(s).getTime());

/** The event in words; never throws, whatever the stored values hold. */
export function describeEvent(e: AuditEventInput, reading: Reading): EventInWords {
	const words = actionWords(text(e.action));
	const actor = text(e.actor).trim() || 'Someone';
	const who = actor === 'system' ? 'Beadline' : actor;
	const changes = changesInWords(e.before, e.after, reading);
	const stamp =
		e.at instanceof Date && !Number.isNaN(e.at.getTime()) ? e.at.toISOString() : text(e.at);
	const at = isIso(stamp)
		? { iso: new Date(stamp).toISOString(), text: momentText(stamp, reading) }
		: { iso: stamp, text: stamp || NONE };
	let sentence = `${who} ${words.did}`;
	if (words.edit) {
		const [one] = changes;
		if (changes.length === 0) sentence = `${who} ${words.did}, with no values changed`;
		else if (changes.length === 1 && one) sentence = `${who} changed ${one.line}`;
		else if (changes.length <= 3)
			sentence = `${who} changed ${list(changes.map((c) => inSentence(c.label)))}`;
		else sentence = `${who} ${words.did}, changing ${changes.length} values`;
	}
	return { label: words.label, sentence, at, changes };
}

/** "a, b and c" */
function list(xs: string[]): string {
	return xs.length < 2 ? (xs[0] ?? '') : `${xs.slice(0, -1).join(', ')} and ${xs[xs.length - 1]}`;
}
