// The words and choices of procedures and PQRs, shared by forms, filters, schemas and pages.

export const CODES = ['asme-ix', 'aws-d1.1', 'iso-15609-1', 'shop'] as const;
export type CodeId = (typeof CODES)[number];
export const CODE_LABELS: Record<CodeId, string> = {
	'asme-ix': 'ASME IX',
	'aws-d1.1': 'AWS D1.1',
	'iso-15609-1': 'ISO 15609-1',
	shop: 'Shop practice (no code)'
};

export const REVISION_STATES = [
	'draft',
	'in-review',
	'approved',
	'superseded',
	'withdrawn'
] as const;
export type RevisionStateId = (typeof REVISION_STATES)[number];
export const STATE_LABELS: Record<RevisionStateId, string> = {
	draft: 'Draft',
	'in-review': 'In review',
	approved: 'Approved',
	superseded: 'Superseded',
	withdrawn: 'Withdrawn'
};

/** States whose revision carries an approving signature (and is checked for tampering). */
export const SIGNED_STATES: readonly RevisionStateId[] = ['approved', 'superseded', 'withdrawn'];

export const PROGRESSIONS = ['uphill', 'downhill'] as const;
export const BEADS = ['stringer', 'weave', 'both'] as const;
export const PASSES = ['single', 'multiple', 'both'] as const;

export const BEAD_LABELS: Record<(typeof BEADS)[number], string> = {
	stringer: 'Stringer',
	weave: 'Weave',
	both: 'Stringer or weave'
};
export const PASS_LABELS: Record<(typeof PASSES)[number], string> = {
	single: 'Single pass',
	multiple: 'Multiple passes',
	both: 'Single or multiple'
};

export const TEST_KINDS = ['visual', 'bend', 'tensile', 'macro', 'radiography', 'impact'] as const;
export type TestKind = (typeof TEST_KINDS)[number];
export const TEST_LABELS: Record<TestKind, string> = {
	visual: 'Visual',
	bend: 'Bend',
	tensile: 'Tensile',
	macro: 'Macro etch',
	radiography: 'Radiography',
	impact: 'Impact (Charpy)'
};
export const TEST_RESULTS = ['pass', 'fail'] as const;
export const STRENGTH_UNITS = ['psi', 'ksi', 'MPa'] as const;
export const ENERGY_UNITS = ['ft-lbf', 'J'] as const;

export const PQR_STATES = ['draft', 'certified'] as const;
export const PQR_STATE_LABELS: Record<(typeof PQR_STATES)[number], string> = {
	draft: 'Draft',
	certified: 'Certified'
};

export const opts = <T extends string>(values: readonly T[], labels?: Partial<Record<T, string>>) =>
	values.map((v) => ({ value: v, label: labels?.[v] ?? v }));
