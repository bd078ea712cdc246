// What the jobs forms share in the browser: the superForm each is set up with, and the choice
// lists of joints and welders. The form data is passed as a getter: it is read once, untracked,
// as superForm wants it.
import { untrack } from 'svelte';
import { superForm, type SuperValidated } from 'sveltekit-superforms';
import type { Infer } from 'sveltekit-superforms';
import { zod4Client } from '$lib/forms/zod4';
import type { Role } from '$lib/roles';

type ClientSchema = Parameters<typeof zod4Client>[0];

/** A job or joint form checked in the browser too, by the schema the server checks it with. */
export function checkedForm<S extends ClientSchema>(
	data: () => SuperValidated<Infer<S>>,
	schema: S,
	resetForm = false
) {
	return untrack(() =>
		superForm(data(), { validators: zod4Client(schema), dataType: 'form', resetForm })
	);
}

/** A step on a joint (inspection, override, repair): judged on the server, as the joint stands. */
export function stepForm<T extends Record<string, unknown>, M>(data: () => SuperValidated<T, M>) {
	return untrack(() => superForm(data(), { dataType: 'form', invalidateAll: true }));
}

export const jointChoices = (joints: ReadonlyArray<{ id: number; mark: string }>) =>
	joints.map((j) => ({ value: String(j.id), label: j.mark }));

export const welderChoices = (
	welders: ReadonlyArray<{ id: number; name: string; stamp: string }>
) => welders.map((w) => ({ value: String(w.id), label: `${w.stamp} ${w.name}` }));

export interface Signer {
	name: string;
	role: Role;
}
