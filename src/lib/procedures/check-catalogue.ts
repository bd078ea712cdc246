// The checks a revision gets beyond the weld core's: its ranges against what the supporting PQRs
// qualify. Listed with the weld core's catalogue on the help page; sources kept here because
// the weld core's tables do not carry these paragraphs.
import { sourceOf, type FindingSource } from '$lib/weld';
import * as S from '$reference/sources';
import type { Source } from '$reference/types';

// The paragraphs as printed in the QW-250 variable tables, read from public checklists that
// reproduce them (see reference/sources.ts ASME_IX_QW_255_256), and QW-401 from a public copy
// of Article IV.
export const QW_424: Source = {
	label: 'ASME IX QW-403.11 / QW-424 (base metals qualified by P-Number)',
	edition:
		'BPVC IX 2004 with 2005 addenda and 2019: QW-403.11 "change in P-No. qualified" is essential for SMAW, SAW, GMAW, FCAW and GTAW (public WPS/PQR checklists)',
	kind: 'published'
};
export const QW_404_4: Source = {
	label: 'ASME IX QW-404.4 (F-Number is an essential variable)',
	edition:
		'BPVC IX 2004 with 2005 addenda and 2019 (public WPS/PQR checklists of QW-253 to QW-256)',
	kind: 'published'
};
export const QW_401: Source = {
	label: 'ASME IX QW-401 / AWS D1.1 Table 4.5 (process change needs a new PQR)',
	edition:
		'BPVC IX Article IV QW-401: "A change from one welding process to another welding process is an essential variable" (public copy of the 1998 edition, 1999 addenda)',
	kind: 'published'
};
export const QW_409_4: Source = {
	label: 'ASME IX QW-409.4 (current type and polarity)',
	edition:
		'BPVC IX 2004 with 2005 addenda and 2019: supplementary essential with toughness testing, nonessential otherwise (public WPS/PQR checklists)',
	kind: 'published'
};
export const PRODUCT: Source = {
	label: 'Beadline: a procedure under a code is supported by a PQR',
	edition: 'product rule',
	kind: 'common practice'
};

/** For the help page's list of sources. */
export const PROCEDURE_SOURCES: readonly Source[] = [
	QW_424,
	QW_404_4,
	QW_401,
	QW_409_4,
	S.ASME_IX_QW_255_256,
	S.ISO_15614_1_2017,
	S.ISO_15614_1_RANGES,
	PRODUCT
];

export const PROCEDURE_ONLY_CHECK_IDS = [
	'pqr-support',
	'pqr-process',
	'pqr-current-type',
	'pqr-p-number',
	'pqr-f-number',
	'pqr-positions',
	'pqr-code-rules'
] as const;

export type ProcedureOnlyCheckId = (typeof PROCEDURE_ONLY_CHECK_IDS)[number];

export interface ProcedureCatalogueEntry {
	id: ProcedureOnlyCheckId;
	on: 'procedure';
	title: string;
	compares: string;
	sources: FindingSource[];
}

const e = (
	id: ProcedureOnlyCheckId,
	title: string,
	compares: string,
	sources: Source[]
): ProcedureCatalogueEntry => ({
	id,
	on: 'procedure',
	title,
	compares,
	sources: sources.map(sourceOf)
});

export const PROCEDURE_CHECK_CATALOGUE: readonly ProcedureCatalogueEntry[] = [
	e(
		'pqr-support',
		'Supported by a PQR',
		'A revision that claims a code and cites no PQR cannot have its ranges checked against a qualification.',
		[PRODUCT]
	),
	e(
		'pqr-process',
		'Same process as the PQR',
		'Each cited PQR was welded with the procedure’s process; another process needs its own PQR.',
		[QW_401]
	),
	e(
		'pqr-current-type',
		'Current type the PQR qualifies',
		'The procedure’s current type and polarity against the ones its PQRs were welded with (QW-409.4; ISO 15614-1 8.4.6 for ISO procedures; D1.1 procedures by their Table 4.5 trigger instead).',
		[QW_409_4, S.ISO_15614_1_RANGES]
	),
	e(
		'pqr-p-number',
		'Base metals by P-Number',
		'Every P-Number the procedure lists against the P-Numbers its PQRs qualify.',
		[QW_424]
	),
	e(
		'pqr-f-number',
		'Filler by F-Number',
		'Every F-Number the procedure lists against the F-Numbers its PQRs were welded with.',
		[QW_404_4]
	),
	e(
		'pqr-positions',
		'Positions the PQRs cover',
		'Every production position against the test positions of the PQRs, by the procedure’s own code: AWS D1.1 Table 4.1 for D1.1 procedures, ISO 15614-1 8.4.2 for ISO ones (a caution where impact or hardness requirements may limit the positions), and the position rules of QW-461.9 applied as the shop’s rule otherwise.',
		[S.ASME_IX_QW_461_9, S.AWS_D1_1_QUALIFICATION, S.ISO_15614_1_RANGES]
	),
	e(
		'pqr-code-rules',
		'Changes from the PQR, by the procedure’s own code',
		'ASME IX procedures: each change from the PQR classed by QW-255 (GMAW, FCAW) or QW-256 (GTAW) as essential, supplementary essential or nonessential. ISO 15614-1 procedures: transfer mode by 8.5.2.3, and a plain note where the standard has no range for the variable. D1.1 procedures keep the Table 4.5 triggers. For D1.1 and ISO procedures, every variable the procedure sets for which Beadline has no rule of that code says so plainly (no D1.1 rule modelled for this variable), and no other code’s rule is applied in its place; P- and F-Numbers are not compared for them, being ASME IX groupings.',
		[S.ASME_IX_QW_255_256, S.ISO_15614_1_2017, S.AWS_D1_1_TABLE_4_5]
	)
];
