// Shared shapes for the reference tables. Every table and every row says where its numbers
// came from, which edition, and how far to trust them.

/**
 * - `published`: read from the named standard or regulation (or a faithful public copy of it).
 * - `common practice`: shop rule of thumb or an equipment maker's chart; no single authority.
 * - `from memory`: recalled by the author without a source at hand; verify before relying on it.
 */
export type SourceKind = 'published' | 'common practice' | 'from memory';

export interface Source {
	/** Short label a welder recognises, e.g. "OSHA 29 CFR 1910.133(a)(5)". */
	label: string;
	/** Edition or date of the text the values were taken from. */
	edition: string;
	kind: SourceKind;
	note?: string;
}

export interface Band {
	min: number;
	max: number;
}

export type Process = 'GTAW' | 'GMAW' | 'FCAW' | 'SMAW';
export type CurrentType = 'DCEN' | 'DCEP' | 'AC';
export type Transfer = 'short-circuit' | 'globular' | 'spray' | 'pulsed-spray';
export type MetalFamily = 'carbon-steel' | 'low-alloy' | 'stainless' | 'aluminium';
