// Every check Beadline runs, for the help page and for the finding's `check` field.
import * as S from '$reference/sources';
import type { Source } from '$reference/types';
import { sourceOf } from './findings';
import type { CheckId, FindingSource } from './types';

export { CHECK_IDS, type CheckId } from './types';

export interface CatalogueEntry {
	id: CheckId;
	title: string;
	compares: string;
	/** Where it runs: on a settings record, on a PQR, or on a welder's qualification. */
	on: 'settings' | 'pqr' | 'welder';
	sources: FindingSource[];
}

const e = (
	id: CheckId,
	on: CatalogueEntry['on'],
	title: string,
	compares: string,
	sources: Source[]
): CatalogueEntry => ({ id, on, title, compares, sources: sources.map(sourceOf) });

export const CHECK_CATALOGUE: readonly CatalogueEntry[] = [
	e(
		'amps-vs-thickness',
		'settings',
		'Amperage for the thickness',
		'Amps against a band for the base metal thickness: GTAW about 1 A per 0.001 in (stainless 10 % lower, aluminium on AC 25 % higher), ±25 %; GMAW by thickness band.',
		[S.THICKNESS_RULE, S.GMAW_THICKNESS_BANDS]
	),
	e(
		'amps-vs-filler',
		'settings',
		'Amperage for the wire or rod size',
		'Amps against the usual range for the GMAW wire (by transfer mode), GTAW rod or SMAW electrode diameter.',
		[S.WIRE_CHART_BRIEF, S.GTAW_ROD_CHART, S.SMAW_ELECTRODE_CHART]
	),
	e(
		'amps-vs-tungsten',
		'settings',
		'Amperage for the tungsten',
		'Amps against the current range for the tungsten diameter, type and current, in two makers’ charts that do not agree.',
		[S.TUNGSTEN_CHART_A, S.TUNGSTEN_CHART_B]
	),
	e(
		'tungsten-vs-current',
		'settings',
		'Tungsten type for the current',
		'Pure tungsten is for AC; zirconiated is for AC; thoriated electrodes need dust control when ground.',
		[S.AWS_A5_12]
	),
	e(
		'wfs-vs-amps',
		'settings',
		'Wire feed speed and amperage',
		'Amps against the wire feed speed divided by the in/min per amp for the wire size, ±20 %.',
		[S.WFS_PER_AMP]
	),
	e(
		'current-type',
		'settings',
		'Current type and polarity',
		'Current type against the process and what the filler classification calls for.',
		[S.POLARITY_PRACTICE, S.AWS_A5_CLASSIFICATION]
	),
	e(
		'heat-input',
		'settings',
		'Heat input',
		'Heat input (ASME QW-409.1, no efficiency factor; ISO/TR 17671-1 with k) against the procedure maximum when one is set.',
		[S.ASME_IX_QW_409_1, S.ISO_TR_17671_1]
	),
	e(
		'lens-shade',
		'settings',
		'Lens shade',
		'The shade in use against the OSHA minimum for the process and amps; ANSI Z49.1 suggested shade shown beside it.',
		[S.OSHA_1910_133, S.ANSI_Z49_1_SHADE]
	),
	e(
		'gas-vs-process',
		'settings',
		'Shielding gas for the process',
		'Gas mix against the process, base metal, transfer mode and the gas the filler classification calls for.',
		[S.GAS_MIX_PRACTICE]
	),
	e(
		'gas-flow',
		'settings',
		'Shielding gas flow',
		'Flow against the usual range for the process and gas (GTAW argon 11–35 CFH, GMAW 25–35 CFH, gas-shielded FCAW 25–50 CFH).',
		[S.GAS_FLOW_PRACTICE, S.GAS_FLOW_FCAW_TEXTBOOK, S.GAS_FLOW_MEMORY]
	),
	e(
		'filler-classification',
		'settings',
		'Filler classification',
		'Reads the AWS classification and what it encodes: spec, minimum tensile, F-Number, A-Number.',
		[S.AWS_A5_CLASSIFICATION, S.ASME_IX_QW_432, S.AWS_D1_2_FILLER_GROUPS, S.ASME_IX_QW_442]
	),
	e(
		'filler-vs-base-metal',
		'settings',
		'Filler for the base metal',
		'The filler family against the base metal family (carbon steel, stainless, aluminium); the wrong family is a caution.',
		[S.AWS_A5_CLASSIFICATION]
	),
	e(
		'base-metal',
		'settings',
		'Base metal grouping',
		'Spec and grade to family, P-Number and Group.',
		[S.ASME_IX_QW_422, S.ASME_IX_QW_422_2013_AL, S.ASME_IX_QW_422_MEMORY]
	),
	e(
		'preheat',
		'settings',
		'Minimum preheat',
		'Preheat against the AWS D1.1 prequalified minimum for category B steels by thickness.',
		[S.AWS_D1_1_TABLE_3_3]
	),
	e(
		'carbon-equivalent',
		'settings',
		'Carbon equivalent',
		'CE(IIW) = C + Mn/6 + (Cr+Mo+V)/5 + (Ni+Cu)/15 against the usual preheat guidance.',
		[S.IIW_CE, S.CE_GUIDANCE]
	),
	e(
		'within-procedure',
		'settings',
		'Within the procedure',
		'Amps, volts, travel speed, wire feed and heat input against the procedure’s ranges.',
		[S.PROCEDURE_RANGES]
	),
	e(
		'requalification',
		'pqr',
		'Requalification triggers',
		'Procedure ranges against the PQR values: amps over 10 % (GMAW, FCAW) or 25 % (GTAW), volts over 7 %, current type or polarity, transfer mode.',
		[S.AWS_D1_1_TABLE_4_5]
	),
	e(
		'pqr-ranges',
		'pqr',
		'Thickness qualified by a PQR',
		'Coupon thickness T and deposit t to the base metal range and maximum deposit qualified.',
		[S.ASME_IX_QW_451_1, S.ASME_IX_QW_403_10]
	),
	e(
		'welder-positions',
		'welder',
		'Positions qualified',
		'Test positions to the groove and fillet positions a welder is qualified for.',
		[S.ASME_IX_QW_461_9]
	),
	e(
		'welder-deposit-thickness',
		'welder',
		'Weld metal thickness qualified',
		'Deposit thickness in the welder’s coupon to the thickness qualified (2t; unlimited from 1/2 in with three layers).',
		[S.ASME_IX_QW_452_1B]
	),
	e(
		'welder-diameter',
		'welder',
		'Pipe diameter qualified',
		'Coupon outside diameter to the smallest diameter qualified.',
		[S.ASME_IX_QW_452_3]
	),
	e(
		'continuity',
		'welder',
		'Continuity',
		'Last logged use of the process (or test date) plus six calendar months to the lapse date and days left.',
		[S.CONTINUITY_SOURCES]
	)
];
