// The shop's overview: one row per qualification of every active welder, soonest lapse first.
import type { OverviewFilter } from '$lib/schemas/welder';
import { csvLine } from '../records/csv';
import { loadWelders } from './read';
import type { QualificationState } from './status';

export interface OverviewRow {
	welderId: number;
	name: string;
	stamp: string;
	qualificationId: number;
	process: string;
	code: string;
	testPositions: string[];
	testDate: string;
	lastActivity: string;
	lapsesOn: string;
	daysLeft: number;
	state: QualificationState;
	dueSoon: boolean;
}

/**
 * Current qualifications by days left (the next to lapse on top), then lapsed ones, the most
 * recently lapsed first: what needs a weld or a retest soonest reads first.
 */
export function byUrgency(a: OverviewRow, b: OverviewRow): number {
	const rank = (r: OverviewRow) => (r.state === 'current' ? 0 : r.state === 'lapsed' ? 1 : 2);
	if (rank(a) !== rank(b)) return rank(a) - rank(b);
	const d = rank(a) === 0 ? a.daysLeft - b.daysLeft : b.daysLeft - a.daysLeft;
	return d || a.name.localeCompare(b.name) || a.process.localeCompare(b.process);
}

export function matchesFilter(r: OverviewRow, f: OverviewFilter): boolean {
	if (f.process && r.process !== f.process) return false;
	if (f.status === 'current' && r.state !== 'current') return false;
	if (f.status === 'due' && !r.dueSoon) return false;
	if (f.status === 'lapsed' && r.state !== 'lapsed') return false;
	if (f.q) {
		const needle = f.q.toLowerCase();
		if (!`${r.name} ${r.stamp}`.toLowerCase().includes(needle)) return false;
	}
	return true;
}

export async function overviewRows(
	shopId: number,
	today: string,
	f: OverviewFilter
): Promise<OverviewRow[]> {
	const welders = await loadWelders(shopId, today, { activeOnly: true });
	const rows: OverviewRow[] = welders.flatMap((w) =>
		w.qualifications
			.filter((q) => q.status.state !== 'withdrawn')
			.map((q) => ({
				welderId: w.id,
				name: w.name,
				stamp: w.stamp,
				qualificationId: q.id,
				process: q.process,
				code: q.code,
				testPositions: q.testPositions,
				testDate: q.testDate,
				lastActivity: q.status.lastActivity,
				lapsesOn: q.status.lapsesOn,
				daysLeft: q.status.daysLeft,
				state: q.status.state,
				dueSoon: q.status.dueSoon
			}))
	);
	return rows.filter((r) => matchesFilter(r, f)).sort(byUrgency);
}

export function overviewCsv(rows: OverviewRow[]): string {
	const head = [
		'welder',
		'welder ID',
		'process',
		'code',
		'test positions',
		'test date',
		'last activity',
		'status',
		'lapses on',
		'days left'
	];
	// A byte-order mark so spreadsheet programs read the UTF-8 right.
	return (
		'\uFEFF' +
		csvLine(head) +
		rows
			.map((r) =>
				csvLine([
					r.name,
					r.stamp,
					r.process,
					r.code,
					r.testPositions.join(' '),
					r.testDate,
					r.lastActivity,
					r.state,
					r.lapsesOn,
					r.state === 'current' ? r.daysLeft : 0
				])
			)
			.join('')
	);
}
