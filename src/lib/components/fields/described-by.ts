// The ids a field's control is described by: its errors, or else its hint (see FieldShell).
export const describedBy = (id: string, errors?: string[], hint?: string): string | undefined =>
	errors?.length ? `${id}-err` : hint ? `${id}-hint` : undefined;

/** The id of a field from its posted name (two forms on one page pass ids of their own). */
export const fieldId = (name: string): string => `f-${name.replace(/[^a-z0-9_-]/gi, '-')}`;
