// CSV of exactly the filtered rows, in the reader's units, read in pages so a large shop's
// export never sits in memory whole.
import type { RecordFilterInput } from '$lib/schemas/settings-record';
import { numericIn } from '$lib/records/display';
import type { SessionUser } from '../auth/session-user';
import { SettingsRecord } from '../models';
import { authorNames, orderFor, resolveFilters } from './list';

const BATCH = 1000;

/** Quotes a cell; text a spreadsheet would run as a formula gets a leading apostrophe. */
export function csvCell(value: string | number | null | undefined): string {
	if (value === null || value === undefined) return '';
	let s = String(value);
	if (typeof value === 'string' && /^[=+\-@\t\r]/.test(s)) s = `'${s}`;
	return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function csvLine(cells: (string | number | null | undefined)[]): string {
	return cells.map(csvCell).join(',') + '\r\n';
}

export function csvHeader(system: SessionUser['unitSystem']): string[] {
	const u = numericIn(system).units;
	return [
		'id',
		'date welded',
		'process',
		'current',
		'transfer',
		'amps (A)',
		'volts (V)',
		`wire feed (${u.speed})`,
		`travel speed (${u.speed})`,
		'filler',
		`filler diameter (${u.length})`,
		'tungsten',
		`tungsten diameter (${u.length})`,
		'gas',
		`gas flow (${u.flow})`,
		'base metal',
		'material',
		'P-Number',
		`thickness (${u.length})`,
		'joint',
		'position',
		`preheat (${u.temperature})`,
		`interpass (${u.temperature})`,
		'machine',
		'job or part',
		'outcome',
		'outcome kind',
		'defects',
		'notes',
		'author',
		'cautions'
	];
}

export function csvRow(r: SettingsRecord, author: string, system: SessionUser['unitSystem']) {
	const n = numericIn(system);
	return [
		r.id,
		r.weldedOn,
		r.process,
		r.currentType,
		r.transfer,
		r.amps,
		r.volts,
		n.speed(r.wireFeedMmPerS),
		n.speed(r.travelSpeedMmPerS),
		r.fillerClass,
		n.length(r.fillerDiameterMm),
		r.tungstenClass,
		n.length(r.tungstenDiameterMm),
		r.gasName,
		n.flow(r.gasFlowLPerMin),
		r.baseMetalSpec,
		r.baseMetalFamily,
		r.pNumber,
		n.length(r.thicknessMm),
		r.jointType,
		r.position,
		n.temperature(r.preheatC),
		n.temperature(r.interpassC),
		r.machine,
		r.jobRef,
		r.outcome,
		r.outcomeKind,
		r.defects,
		r.notes,
		author,
		r.cautionCount
	];
}

/** A stream of CSV text: the header, then every filtered row in the list's order. */
export function recordsCsv(actor: SessionUser, f: RecordFilterInput): ReadableStream<Uint8Array> {
	const { where } = resolveFilters(f, actor.shopId, actor.unitSystem);
	const order = orderFor(f);
	const encoder = new TextEncoder();
	let offset = 0;
	let names: Map<string, string> | null = null;
	return new ReadableStream<Uint8Array>({
		async start(controller) {
			// A byte-order mark so spreadsheet programs read the UTF-8 (°, –) right.
			controller.enqueue(encoder.encode('\uFEFF' + csvLine(csvHeader(actor.unitSystem))));
		},
		async pull(controller) {
			names ??= await authorNames(actor.shopId);
			const rows = await SettingsRecord.findAll({ where, order, limit: BATCH, offset });
			offset += rows.length;
			const text = rows
				.map((r) => csvLine(csvRow(r, names?.get(r.authorId) ?? '', actor.unitSystem)))
				.join('');
			if (text) controller.enqueue(encoder.encode(text));
			if (rows.length < BATCH) controller.close();
		}
	});
}
