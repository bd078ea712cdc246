// The ids a field's control is described by: its errors, or else its hint (see FieldShell).
import type { FormFields } from './form-fields.svelte';

export const describedBy = (id: string, errors?: string[], hint?: string): string | undefined =>
	errors?.length ? `${id}-err` : hint ? `${id}-hint` : undefined;

/** The id of a field from its posted name (two forms on one page pass ids of their own). */
export const fieldId = (name: string): string => `f-${name.replace(/[^a-z0-9_-]/gi, '-')}`;

/** What FieldShell hands its control: the attributes that tie it to its label, hint and errors. */
export interface Control {
	id: string;
	name: string;
	'aria-invalid': 'true' | undefined;
	'aria-describedby': string | undefined;
}

/** The value a control binds to (`bind:value={bound.get, bound.set}`). */
export interface Bound<V> {
	get(): V;
	set(value: V): void;
}

/** The props every single-control field takes (Field, ChoiceField). */
export interface FieldProps {
	label: string;
	name: string;
	errors?: string[] | undefined;
	hint?: string;
	/** Two forms on one page may share a field name; they pass ids of their own. */
	id?: string | null;
	/** The form the field belongs to: its value and errors are read and written there by name. */
	fields?: FormFields;
	/** Classes of the field's own box (label, control, hint, errors), e.g. its span in a grid. */
	cell?: string;
}
