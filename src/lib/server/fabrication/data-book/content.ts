// The words of the weld map and weld log, from the records: for each joint the procedure revision
// with its digest, then round by round each pass (date, welder, the qualification that covered
// the process on that day), the inspections and the repair that opened the next round, and last
// the overrides an inspector signed. Shop-facing wording; the PDF only lays it out.
import { CODE_LABELS, type CodeId } from '$lib/procedures/options';
import type { JointStatus, JointView, LogView } from '$lib/jobs/types';
import type { WeldMapInput, WeldMapJoint, WeldMapLine } from '../../pdf/weld-map';
import { shortDigest, utcText } from '../../pdf/sheet-content';
import type { QualificationView, WelderView } from '../../welders/read';
import type { BookRecords, CitedRevision } from './records';

export const STATUS_WORDS: Record<JointStatus, string> = {
	open: 'Not welded yet',
	welded: 'Welded, not inspected',
	accepted: 'Accepted',
	rejected: 'REJECTED',
	repaired: 'Repaired, to inspect'
};

/** The welders as of each weld's day, keyed `day|welderId`. */
export type WeldDayWelders = ReadonlyMap<string, WelderView>;

const revisionLabel = (r: CitedRevision | undefined) =>
	r ? `${r.number} rev ${r.rev}` : '(unknown procedure)';

function qualificationWords(q: QualificationView, day: string): string {
	const tested = `${q.process} ${q.code}, tested ${q.testPositions.join('+')} ${q.couponType} on ${q.testDate}`;
	const s = q.status;
	const state =
		s.state === 'current'
			? `current on ${day} (until ${s.lapsesOn})`
			: s.state === 'lapsed'
				? `LAPSED on ${day} (since ${s.lapsesOn})`
				: 'withdrawn';
	return `${tested}: ${state}`;
}

/** The welder's qualification for the process on the weld's day, in words. */
export function qualificationOn(
	welder: WelderView | undefined,
	process: string,
	day: string
): string {
	if (!welder) return 'no welder record';
	const held = welder.qualifications.filter((q) => q.process === process);
	const q = held.find((x) => x.status.state === 'current') ?? held[0];
	return q ? qualificationWords(q, day) : `no ${process || 'matching'} qualification on record`;
}

function passLine(
	l: LogView,
	joint: JointView,
	revisions: CitedRevision[],
	welders: WeldDayWelders
): WeldMapLine {
	const r = revisions.find((x) => x.id === l.revisionId);
	const welder = welders.get(`${l.weldedOn}|${l.welderId}`);
	const parts = [
		l.weldedOn,
		`${l.welderName} (${l.stamp})`,
		qualificationOn(welder, r?.process ?? joint.process, l.weldedOn)
	];
	if (l.revisionId !== joint.revisionId) parts.push(`to ${revisionLabel(r)}`);
	if (l.overrideId) parts.push(`logged under override #${l.overrideId}`);
	return {
		label: l.round ? `Repair ${l.round}, ${l.pass}` : `Pass: ${l.pass}`,
		text: parts.join(' · '),
		stop: !!l.overrideId
	};
}

function jointLines(
	j: JointView,
	records: Pick<BookRecords, 'revisions' | 'reports'>,
	welders: WeldDayWelders
): WeldMapLine[] {
	const r = records.revisions.find((x) => x.id === j.revisionId);
	const lines: WeldMapLine[] = [
		{
			label: 'Procedure',
			text: r
				? `${revisionLabel(r)} (${r.state}) · digest ${shortDigest(r.digest)}${r.signedDigest ? '' : ' · never signed'}`
				: revisionLabel(r),
			stop: !r || !r.signedDigest
		}
	];
	if (r && !r.intact)
		lines.push({
			label: 'Warning',
			text: 'The revision as stored no longer matches what was signed. Ask the quality manager before relying on it.',
			stop: true
		});
	const h = j.history;
	for (let round = 0; round <= h.round; round++) {
		for (const l of h.logs.filter((x) => x.round === round))
			lines.push(passLine(l, j, records.revisions, welders));
		for (const i of h.inspections.filter((x) => x.round === round)) {
			const report = records.reports.find((p) => p.inspectionId === i.id);
			const parts = [
				i.extent,
				i.result === 'accept' ? 'accepted' : 'REJECTED',
				...(i.note ? [i.note] : []),
				`signed ${i.printedName} (${i.role}) ${utcText(new Date(i.signedAt))}`,
				`digest ${shortDigest(i.digest)}`,
				...(report ? [`report ${report.name}`] : [])
			];
			lines.push({
				label: `${i.method}${round ? ` (repair ${round})` : ''}`,
				text: parts.join(' · '),
				stop: i.result !== 'accept'
			});
		}
		const repair = h.repairs.find((x) => x.round === round + 1);
		if (repair)
			lines.push({
				label: `Repair ${repair.round}`,
				text: [
					`under ${repair.procedureLabel}`,
					`by ${repair.welderName} (${repair.stamp})`,
					...(repair.note ? [repair.note] : []),
					`opened by ${repair.recordedByName} ${utcText(new Date(repair.recordedAt))}`
				].join(' · ')
			});
	}
	for (const o of h.overrides)
		lines.push({
			label: `Override #${o.id}`,
			text: `${o.welderName} (${o.stamp}) was refused: “${o.refusal}” Allowed because: “${o.reason}” · signed ${o.printedName} (${o.role}) ${utcText(new Date(o.signedAt))} · digest ${shortDigest(o.digest)}`,
			stop: true
		});
	if (lines.length === 1) lines.push({ label: 'Weld log', text: 'Nothing logged yet.' });
	return lines;
}

/** Words joined by a space, the empty ones left out (a joint listed without size or metals). */
const words = (...xs: string[]) => xs.filter((x) => x.trim()).join(' ');

export function weldMapContent(
	records: BookRecords,
	welders: WeldDayWelders,
	meta: {
		url: string;
		compiledAt: Date;
		compiledBy: string;
		contents: string[];
	}
): WeldMapInput {
	const j = records.job;
	const joints: WeldMapJoint[] = j.joints.map((x) => ({
		heading: [x.mark, words(x.jointType, x.size), x.baseMetals, x.position]
			.filter(Boolean)
			.join(' · '),
		status: STATUS_WORDS[x.history.status],
		lines: jointLines(x, records, welders)
	}));
	const welderList = (x: JointView) =>
		[...new Set(x.history.logs.map((l) => l.welderName))].join(', ') || '—';
	return {
		shopName: records.shopName,
		paper: records.units === 'imperial' ? 'letter' : 'a4',
		url: meta.url,
		compiledAt: meta.compiledAt,
		compiledBy: meta.compiledBy,
		jobNumber: j.number,
		cover: [
			['Customer', j.customer],
			['Part', j.part],
			['Drawing', j.drawing],
			['Drawing revision', j.drawingRev],
			['Governing code', CODE_LABELS[j.code as CodeId] ?? j.code],
			...(j.dueOn ? ([['Due', j.dueOn]] as [string, string][]) : []),
			['Compiled', utcText(meta.compiledAt)],
			['Compiled by', meta.compiledBy]
		],
		map: j.joints.map((x) => [
			x.mark,
			words(x.jointType, x.size, x.position),
			`${x.procedureNumber} rev ${x.rev}`,
			welderList(x),
			STATUS_WORDS[x.history.status]
		]),
		joints,
		contents: meta.contents
	};
}
