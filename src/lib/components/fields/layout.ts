// How a form lays out the variables: data only. A form lists its sections and, in each, the
// entries it shows; the words, units and choices come from the description of the variables
// ($lib/schemas/variables) unless the form says otherwise. The components in this folder render
// any layout, so two forms differ by their layouts, not by their markup.
import type { UnitSystem } from '$lib/weld';
import type { Choice, UnitKind, VariableId } from '$lib/schemas/variables';

export type Values = Record<string, unknown>;

export type EntryKind = 'text' | 'quantity' | 'range' | 'choice' | 'set' | 'notes' | 'processGroup';

export interface Entry {
	/** The posted field (a range posts `<name>Min` and `<name>Max`). */
	name: string;
	/** The variable it holds; its label, unit, choices and processes are the defaults. */
	of?: VariableId;
	/** Default: a choice where the variable has choices, a quantity where it has a unit, else text. */
	kind?: EntryKind;
	/** This form's words where they differ; a function reads the form's values. */
	label?: string | ((values: Values) => string);
	/** The unit in the reader's system, after the label ("Amperage (A)") or as the hint. */
	unitShown?: 'label' | 'hint';
	/** A quantity that is not a described variable (a pipe's outside diameter). */
	unit?: UnitKind;
	hint?: string | Record<UnitSystem, string>;
	placeholder?: string;
	/** Choices where the form's differ from the variable's (or it has none); a function reads
	 * the form's values (the test positions of the coupon chosen). */
	choices?: readonly Choice[] | ((values: Values) => readonly Choice[]);
	/** A choice's "not given" label; omit for a required choice. */
	empty?: string;
	/** Hide where the variable does not apply to the chosen process. */
	gated?: boolean;
	/** Shown only while this holds (a PWHT temperature only where PWHT is required). */
	when?: (values: Values) => boolean;
	/** Spans both columns of the section's grid. */
	wide?: boolean;
	/** Rows of a notes box. */
	rows?: number;
	/** Input attributes passed through: inputmode, autocomplete, list, type … */
	attrs?: Record<string, string>;
	/** A process group's own words for its parts. */
	parts?: Partial<Record<ProcessPart, Partial<Entry>>>;
}

export interface Section {
	/** The heading shown; also the section's accessible name unless `aria` says otherwise. */
	heading?: string;
	aria?: string;
	/** The heading's size classes; default `text-lg`. */
	headingClass?: string;
	/** Drawn as a panel of its own (default) or as a plain row of a form that is one panel. */
	panel?: boolean;
	/** The grid's classes (columns); default two columns from small screens up. */
	grid?: string;
	entries: readonly Entry[];
}

/**
 * How a form hides what the chosen process does not use: `css` keeps the fields in the page and
 * hides them with a style that follows the process select even before JavaScript loads; `render`
 * leaves them out of the page (and so out of the post).
 */
export type Gate = 'css' | 'render';

export type ProcessPart = 'process' | 'currentType' | 'transfer';

/** The process group's three entries: process, current and polarity, transfer mode (GMAW). */
export function processEntries(parts: Partial<Record<ProcessPart, Partial<Entry>>> = {}): Entry[] {
	return [
		{ name: 'process', of: 'process', ...parts.process },
		{ name: 'currentType', of: 'currentType', empty: '—', ...parts.currentType },
		{ name: 'transfer', of: 'transfer', empty: '—', gated: true, ...parts.transfer }
	];
}
