// The job's weld log as CSV: one line per logged pass, with the procedure revision it was welded
// to, the welder, any override, and the joint's state now. Cells that a spreadsheet would run as
// a formula are defused by csvLine.
import { STATUS_WORDS } from '$lib/jobs/status';
import type { JobView } from './read';
import { csvLine } from '../records/csv';

export function weldLogCsv(job: JobView, revisionLabels: Map<number, string>): string {
	const head = [
		'job',
		'joint',
		'round',
		'pass',
		'welded on',
		'welder',
		'welder ID',
		'procedure revision',
		'override',
		'joint state now'
	];
	const lines = job.joints.flatMap((j) =>
		j.history.logs.map((l) =>
			csvLine([
				job.number,
				j.mark,
				l.round === 0 ? 'first weld' : `repair ${l.round}`,
				l.pass,
				l.weldedOn,
				l.welderName,
				l.stamp,
				revisionLabels.get(l.revisionId) ?? `${j.procedureNumber} rev ${j.rev}`,
				l.overrideId
					? (j.history.overrides.find((o) => o.id === l.overrideId)?.reason ?? 'yes')
					: '',
				STATUS_WORDS[j.history.status]
			])
		)
	);
	// A byte-order mark so spreadsheet programs read the UTF-8 right.
	return '\uFEFF' + csvLine(head) + lines.join('');
}
