// CSV of exactly the filtered rows, in the reader's units, read in pages so a large shop's
// export never sits in memory whole.
import type { RecordFilterInput } from '$lib/schemas/settings-record';
import { numericIn } from '$lib/records/display';
import type { SessionUser } from '../auth/session-user';
import { SettingsRecord } from '../models';
import { authorNames } from './choices';
import { orderFor, resolveFilters } from './list';

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

/**
 * A stream of CSV text: the header, then every filtered row in the list's order. The ordered ids
 * come from one query; rows are then read by primary key in batches, so a large export costs one
 * sorted scan rather than one per page (offset paging re-scans everything before each page).
 */
export function recordsCsv(actor: SessionUser, f: RecordFilterInput): ReadableStream<Uint8Array> {
	const { where } = resolveFilters(f, actor.shopId, actor.unitSystem);
	const encoder = new TextEncoder();
	let ids: number[] | null = null;
	let names: Map<string, string> | null = null;
	let next = 0;
	return new ReadableStream<Uint8Array>({
		start(controller) {
			// A byte-order mark so spreadsheet programs read the UTF-8 (°, –) right.
			controller.enqueue(encoder.encode('\uFEFF' + csvLine(csvHeader(actor.unitSystem))));
		},
		async pull(controller) {
			if (ids === null) {
				const found = await SettingsRecord.findAll({
					where,
					order: orderFor(f),
					attributes: ['id'],
					raw: true
				});
				ids = found.map((r) => r.id);
				names = await authorNames(actor.shopId);
			}
			const batch = ids.slice(next, next + BATCH);
			next += batch.length;
			if (batch.length) {
				const rows = await SettingsRecord.findAll({
					where: { id: batch, shopId: actor.shopId },
					raw: true
				});
				const byId = new Map(rows.map((r) => [r.id, r]));
				const text = batch
					.map((id) => byId.get(id))
					.filter((r): r is SettingsRecord => r !== undefined)
					.map((r) => csvLine(csvRow(r, names?.get(r.authorId) ?? '', actor.unitSystem)))
					.join('');
				controller.enqueue(encoder.encode(text));
			}
			if (next >= ids.length) controller.close();
		}
	});
}
