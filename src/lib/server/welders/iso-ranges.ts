// An ISO 9606-1 qualification in its own terms: the weld core's ISO 9606-1 ranges from the facts
// Beadline records for every WPQ. An adapter only: the rules live in src/lib/weld.
import { ASME_TO_ISO } from '$reference/iso-6947';
import { PROCESS_ISO4063 } from '$reference/heat-input-k';
import type { Process } from '$reference/types';
import { isoWelderRanges, type IsoWelderItem } from '$lib/weld/iso-9606-ranges';

export interface IsoFacts {
	code: string;
	process?: string;
	testPositions: string[];
	couponType: 'plate' | 'pipe';
	couponDiameterMm: number | null;
	couponThicknessMm?: number;
}

/** ISO 9606-1 ranges for an ISO 9606-1 qualification; null for other codes. */
export function isoRangesFor(q: IsoFacts): IsoWelderItem[] | null {
	if (q.code !== 'ISO 9606-1') return null;
	const process = q.process as Process | undefined;
	const iso4063 = process && PROCESS_ISO4063[process];
	// Up-progression is the ISO position an ASME test is usually read as (3G -> PF, 5G -> PH).
	const positions = q.testPositions.map((p) => ASME_TO_ISO[p.trim().toUpperCase()]?.[0] ?? p);
	const fillet = q.testPositions.length > 0 && q.testPositions.every((p) => /F/i.test(p));
	return isoWelderRanges({
		process: iso4063 ? String(iso4063) : undefined,
		product: q.couponType,
		weld: fillet ? 'fillet' : 'butt',
		thicknessMm: q.couponThicknessMm,
		outsideDiameterMm: q.couponType === 'pipe' ? (q.couponDiameterMm ?? undefined) : undefined,
		positions
	}).items;
}
