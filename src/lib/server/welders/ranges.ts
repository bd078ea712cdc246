// The ranges a qualification qualifies, computed by the weld core (ASME IX) with the source of
// each. An adapter only: the rules live in src/lib/weld/qualified-ranges.ts.
import type { WeldPosition } from '$reference/asme-ix-qw-461-9';
import type { FindingSource } from '$lib/weld/findings';
import {
	welderDepositThickness,
	welderDiameterRange,
	welderPositions
} from '$lib/weld/qualified-ranges';
import type { IsoWelderItem } from '$lib/weld/iso-9606-ranges';
import { lengthToMm, mmToLength, type LengthUnit } from '$lib/weld/units';
import { isoRangesFor } from './iso-ranges';

export interface QualificationFacts {
	code: string;
	testPositions: string;
	couponType: 'plate' | 'pipe';
	couponDiameterMm: number | null;
	depositThicknessMm: number;
	depositLayers: number | null;
	lengthUnit: LengthUnit;
	fNumber: number | null;
	process?: string;
	couponThicknessMm?: number;
}

export interface QualifiedRanges {
	groove: WeldPosition[];
	groovePipe: WeldPosition[];
	fillet: WeldPosition[];
	positionsSource: FindingSource;
	/** Deposited weld metal thickness qualified, in mm; null = no limit ("maximum to be welded"). */
	depositMaxMm: number | null;
	depositSource: FindingSource;
	/** Smallest pipe OD qualified in mm (null = the size welded); the largest is unlimited. */
	minDiameterMm: number | null;
	minDiameterIsSizeWelded: boolean;
	diameterSource: FindingSource;
	fNumber: number | null;
	/** Said once beside the ranges when the code tested to is not ASME IX. */
	codeNote: string | null;
	/** ISO 9606-1 qualifications: the ranges in ISO 9606-1's own terms (clause by clause). */
	iso: IsoWelderItem[] | null;
}

export const splitPositions = (s: string): string[] =>
	s
		.split(',')
		.map((p) => p.trim())
		.filter(Boolean);

// QW-461.9, plate rows: a plate test qualifies pipe grooves and fillets from 2-7/8 in (73 mm) OD.
const PLATE_TO_PIPE = { in: 2.875, mm: 73 } as const;
const PLATE_TO_PIPE_SOURCE: FindingSource = {
	label: 'ASME BPVC Section IX QW-461.9 (plate tests: pipe 2-7/8 in (73 mm) OD and over)',
	kind: 'published'
};

export function qualifiedRanges(q: QualificationFacts): QualifiedRanges {
	const unit = q.lengthUnit;
	const pos = welderPositions(splitPositions(q.testPositions));
	const dep = welderDepositThickness(
		{ value: mmToLength(q.depositThicknessMm, unit), unit },
		q.depositLayers ?? undefined
	);
	if (!dep.ok) throw new Error(dep.message);
	let minDiameterMm: number | null = lengthToMm(PLATE_TO_PIPE[unit], unit);
	let minDiameterIsSizeWelded = false;
	let diameterSource = PLATE_TO_PIPE_SOURCE;
	if (q.couponType === 'pipe' && q.couponDiameterMm) {
		const d = welderDiameterRange({ value: mmToLength(q.couponDiameterMm, unit), unit });
		if (!d.ok) throw new Error(d.message);
		minDiameterIsSizeWelded = d.min === 'size welded';
		minDiameterMm = d.min === 'size welded' ? q.couponDiameterMm : lengthToMm(d.min.value, unit);
		diameterSource = d.source;
	}
	return {
		groove: pos.groove,
		groovePipe: pos.groovePipe,
		fillet: pos.fillet,
		positionsSource: pos.source,
		depositMaxMm: dep.max === 'unlimited' ? null : lengthToMm(dep.max.value, dep.max.unit),
		depositSource: dep.source,
		minDiameterMm,
		minDiameterIsSizeWelded,
		diameterSource,
		fNumber: q.fNumber,
		codeNote:
			q.code === 'ASME IX'
				? null
				: q.code === 'ISO 9606-1'
					? 'ISO 9606-1 ranges in its own terms are listed below; the ASME IX rows above are for comparison only. Check them in ISO 9606-1.'
					: `Ranges are computed with ASME IX tables; ${q.code} sets its own ranges. Check them in ${q.code}.`,
		iso: isoRangesFor({
			code: q.code,
			process: q.process,
			testPositions: splitPositions(q.testPositions),
			couponType: q.couponType,
			couponDiameterMm: q.couponDiameterMm,
			couponThicknessMm: q.couponThicknessMm
		})
	};
}
