// The ISO designation beside an AWS classification, where Beadline has one (issue 15). Pure;
// never throws; an unknown classification answers no rows rather than a guess.
import { ISO_FILLER_ROWS } from '$reference/iso-filler-designations';
import { sourceOf, type FindingSource } from './findings';

export interface IsoFillerDesignation {
	standard: string;
	designation: string;
	use: 'GMAW' | 'GTAW' | 'both';
	note: string;
	source: FindingSource;
}

/** ISO designations of an AWS wire or rod; with a process, only those for that process. */
export function isoFillerDesignations(aws: unknown, process?: unknown): IsoFillerDesignation[] {
	if (typeof aws !== 'string') return [];
	const key = aws.trim().toUpperCase().slice(0, 20);
	// The process by name or by its ISO 4063 number (135 MAG, 131 MIG, 141 TIG).
	const p =
		process === 'GMAW' || process === '135' || process === '131'
			? 'GMAW'
			: process === 'GTAW' || process === '141'
				? 'GTAW'
				: null;
	return ISO_FILLER_ROWS.filter(
		(r) => r.aws.toUpperCase() === key && (p === null || r.use === 'both' || r.use === p)
	).map((r) => ({
		standard: r.standard,
		designation: r.designation,
		use: r.use,
		note: r.note,
		source: sourceOf(r.source)
	}));
}
