// One form's values and errors as the field components read and write them, by field name.
// The forms' superForm stores hold typed objects; the components only know names, so this is the
// one place that reads them as plain records.
import { fromStore, type Readable } from 'svelte/store';
import type { SuperForm } from 'sveltekit-superforms';
import type { UnitSystem } from '$lib/weld';
import type { Values } from './layout';

export interface FormFields {
	readonly values: Values;
	readonly system: UnitSystem;
	text(name: string): string;
	list<T>(name: string): T[];
	set(name: string, value: unknown): void;
	errors(name: string): string[] | undefined;
}

type Writes = { update(fn: (v: Values) => Values, options?: { taint?: boolean }): void };

/** `system` overrides the form's own `units` field (the record form takes the person's). */
export function formFields<T extends Record<string, unknown>, M>(
	sf: SuperForm<T, M>,
	system?: () => UnitSystem
): FormFields {
	const form = fromStore(sf.form as unknown as Readable<Values>);
	const errors = fromStore(sf.errors as unknown as Readable<Record<string, unknown>>);
	const writes = sf.form as unknown as Writes;
	return {
		get values() {
			return form.current;
		},
		get system() {
			return system?.() ?? (form.current.units === 'metric' ? 'metric' : 'imperial');
		},
		text: (name) => {
			const v = form.current[name];
			return v === null || v === undefined ? '' : String(v);
		},
		list: <L>(name: string) => {
			const v = form.current[name];
			return (Array.isArray(v) ? v : []) as L[];
		},
		set: (name, value) => writes.update((x) => ({ ...x, [name]: value }), { taint: true }),
		errors: (name) => {
			const x = errors.current[name];
			if (Array.isArray(x)) return x as string[];
			if (x && typeof x === 'object') {
				// A list's errors: its own (`_errors`) and each item's.
				const all = Object.values(x as Record<string, unknown>).flat();
				const texts = all.filter((e): e is string => typeof e === 'string');
				return texts.length ? texts : undefined;
			}
			return undefined;
		}
	};
}
