// Suggestions for the form's typeahead fields, straight from the reference tables. Read on the
// server (the record pages' loads): the page gets the strings its datalists show, not the tables.
import { BASE_METALS } from '$reference/base-metals';
import { FILLERS } from '$reference/fillers';
import { GAS_MIXES } from '$reference/shielding-gas';
import { TUNGSTEN_CLASSES } from '$reference/tungsten';

export interface Suggestion {
	value: string;
	label: string;
}

// Covered electrodes and flux-cored wires the parser reads but the table does not list.
const MORE_FILLERS: Suggestion[] = [
	{ value: 'E6010', label: 'AWS A5.1 covered electrode' },
	{ value: 'E6011', label: 'AWS A5.1 covered electrode' },
	{ value: 'E6013', label: 'AWS A5.1 covered electrode' },
	{ value: 'E7018', label: 'AWS A5.1 covered electrode, low hydrogen' },
	{ value: 'E71T-1C', label: 'AWS A5.20 flux-cored, CO2' },
	{ value: 'E71T-1M', label: 'AWS A5.20 flux-cored, mixed gas' },
	{ value: 'E71T-11', label: 'AWS A5.20 flux-cored, self-shielded' }
];

export const FILLER_SUGGESTIONS: Suggestion[] = [
	...FILLERS.map((f) => ({ value: f.classification, label: `${f.spec}, F-${f.fNumber}` })),
	...MORE_FILLERS
];

export const BASE_METAL_SUGGESTIONS: Suggestion[] = BASE_METALS.map((m) => ({
	value: m.key,
	label: `${m.name}${m.pNumber ? ` · P-${m.pNumber}${m.group ? ` Gr ${m.group}` : ''}` : ''}`
}));

export const TUNGSTEN_SUGGESTIONS: Suggestion[] = TUNGSTEN_CLASSES.map((t) => ({
	value: t.classification,
	label: `${t.oxide}, ${t.colour}`
}));

/** Common mixes as choices; free text is allowed too. */
export const GAS_SUGGESTIONS: Suggestion[] = GAS_MIXES.map((g) => ({
	value: g.name,
	label: g.use
}));

/** What the record form's datalists offer (RecordForm.svelte). */
export interface RecordSuggestions {
	fillers: Suggestion[];
	metals: Suggestion[];
	tungstens: Suggestion[];
	gases: Suggestion[];
}

export const RECORD_SUGGESTIONS: RecordSuggestions = {
	fillers: FILLER_SUGGESTIONS,
	metals: BASE_METAL_SUGGESTIONS,
	tungstens: TUNGSTEN_SUGGESTIONS,
	gases: GAS_SUGGESTIONS
};
