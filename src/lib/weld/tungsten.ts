// AWS A5.12 tungsten electrodes: read the classification, look up current ranges per chart.
import {
	TUNGSTEN_AMPS,
	TUNGSTEN_CLASSES,
	type TungstenAmpTable,
	type TungstenClassRow
} from '$reference/tungsten';
import { AWS_A5_12 } from '$reference/sources';
import type { Band, CurrentType, Source } from '$reference/types';
import type { CheckContext } from './context';
import { isNum, sourceOf, type Finding, guardCheck } from './findings';
import { formatLength } from './units';

export type TungstenResult =
	{ ok: true; tungsten: TungstenClassRow } | { ok: false; message: string };

const key = (s: unknown): string =>
	typeof s === 'string' ? s.toUpperCase().replace(/[\s_–—−-]/g, '') : '';

const LOOKUP = new Map<string, TungstenClassRow>();
for (const row of TUNGSTEN_CLASSES) {
	LOOKUP.set(key(row.classification), row);
	for (const iso of row.iso6848) LOOKUP.set(key(iso), row);
}
const byClass = (c: string): TungstenClassRow | undefined => LOOKUP.get(key(c));

const WORDS: Record<string, string> = {
	PURE: 'EWP',
	PURETUNGSTEN: 'EWP',
	THORIATED: 'EWTh-2',
	'2%THORIATED': 'EWTh-2',
	CERIATED: 'EWCe-2',
	'2%CERIATED': 'EWCe-2',
	ZIRCONIATED: 'EWZr-1',
	'1.5%LANTHANATED': 'EWLa-1.5',
	'2%LANTHANATED': 'EWLa-2',
	'1%LANTHANATED': 'EWLa-1'
};

/** Parses EWLa-1.5, ewla1.5, WL15, "2% ceriated" and the like. */
export function parseTungsten(text: unknown): TungstenResult {
	if (typeof text !== 'string' || text.trim() === '' || text.length > 40)
		return {
			ok: false,
			message: 'Enter a tungsten classification such as EWLa-1.5, EWCe-2 or EWP.'
		};
	const k = key(text);
	const direct = LOOKUP.get(k) ?? (WORDS[k] ? byClass(WORDS[k] ?? '') : undefined);
	if (direct) return { ok: true, tungsten: direct };
	if (k.includes('LANTHANATED'))
		return {
			ok: false,
			message: 'Lanthanated tungsten comes as EWLa-1, EWLa-1.5 and EWLa-2: which one?'
		};
	return {
		ok: false,
		message: `“${text.trim()}” is not an AWS A5.12 tungsten classification Beadline knows (EWP, EWCe-2, EWLa-1, EWLa-1.5, EWLa-2, EWTh-1, EWTh-2, EWZr-1, EWG).`
	};
}

/** Largest gap (mm) between a measured diameter and a table size still taken as that size. */
const SIZE_TOLERANCE_MM = 0.06;

export interface TungstenRange {
	chart: TungstenAmpTable['id'];
	source: Source;
	/** Null when this chart has no row for the size, type and current. */
	amps: Band | null;
}

/**
 * Current ranges for a tungsten, one entry per chart. EWG has no fixed oxide, so no range. Pure
 * tungsten on DC and zirconiated on DC get no range: the charts do not recommend them.
 */
export function tungstenAmpRanges(
	classification: string,
	diameterMm: number,
	current: CurrentType
): TungstenRange[] {
	const row = byClass(classification);
	if (!row || row.group === 'other' || !Number.isFinite(diameterMm) || current === 'DCEP')
		return [];
	const wanted = current === 'AC' ? 'AC' : 'DCEN';
	return TUNGSTEN_AMPS.map((table) => {
		const hit = table.rows.find(
			(r) =>
				r.group === row.group &&
				r.current === wanted &&
				Math.abs(r.diameterMm - diameterMm) <= SIZE_TOLERANCE_MM
		);
		return { chart: table.id, source: table.source, amps: hit ? hit.amps : null };
	});
}

/** Tungsten diameters the charts list, in mm, for messages. */
export const TUNGSTEN_SIZES_MM = [1.0, 1.6, 2.4, 3.2] as const;

export { byClass as tungstenClass };

const ampsText = (b: Band): string => `${b.min}–${b.max} A`;

/**
 * Amps against both charts. Inside both: ok. Inside one only: caution naming the other. Above
 * every chart: outside (the tip melts). Below every chart: caution (the arc wanders; a smaller
 * tungsten suits), since running cold does no harm to the electrode.
 */
function checkAmpsVsTungstenUnguarded(ctx: CheckContext): Finding | null {
	const { amps, currentType } = ctx.s;
	const t = ctx.tungsten;
	const d = ctx.s.tungsten?.diameterMm;
	if (!t || !isNum(amps) || !isNum(d) || !currentType || ctx.s.process !== 'GTAW') return null;
	const ranges = tungstenAmpRanges(t.classification, d, currentType).filter(
		(r): r is TungstenRange & { amps: Band } => r.amps !== null
	);
	if (ranges.length === 0) return null;
	const inside = ranges.filter((r) => amps >= r.amps.min && amps <= r.amps.max);
	const size = formatLength(d, ctx.system);
	const what = `${size} ${t.classification} on ${currentType}`;
	const list = ranges
		.map((r) => `${ampsText(r.amps)} in ${r.chart === 'chart-a' ? 'chart A' : 'chart B'}`)
		.join(', ');
	const a = Math.round(amps * 10) / 10;
	const first = ranges[0] as TungstenRange & { amps: Band };
	const lowest = Math.min(...ranges.map((r) => r.amps.min));
	const highest = Math.max(...ranges.map((r) => r.amps.max));
	let status: Finding['status'];
	let message: string;
	if (inside.length === ranges.length) {
		status = 'ok';
		message = `${a} A is within the current range for ${what} (${list}).`;
	} else if (inside.length > 0) {
		status = 'caution';
		message = `${a} A is inside one chart but not the other for ${what} (${list}); the charts disagree, so watch the tip.`;
	} else if (amps > highest) {
		status = 'outside';
		message = `${a} A is above the current range for ${what} (${list}); the tip will ball or melt. Use a larger tungsten.`;
	} else if (amps < lowest) {
		status = 'caution';
		message = `${a} A is below the current range for ${what} (${list}); the arc may wander. A smaller tungsten suits this current.`;
	} else {
		status = 'caution';
		message = `${a} A falls between the charts' ranges for ${what} (${list}).`;
	}
	return {
		check: 'amps-vs-tungsten',
		status,
		message,
		value: amps,
		expected: { min: first.amps.min, max: first.amps.max, unit: 'A' },
		source: sourceOf((inside[0] ?? first).source),
		field: 'tungsten.diameter'
	};
}

function checkTungstenVsCurrentUnguarded(ctx: CheckContext): Finding | null {
	const t = ctx.tungsten;
	const current = ctx.s.currentType;
	if (!t || !current || ctx.s.process !== 'GTAW') return null;
	const base = {
		check: 'tungsten-vs-current' as const,
		value: t.classification,
		expected: { unit: current },
		source: sourceOf(AWS_A5_12),
		field: 'tungsten.classification'
	};
	if ((t.group === 'pure' || t.group === 'zirconiated') && current !== 'AC')
		return {
			...base,
			status: 'outside',
			message: `${t.classification} is for AC; on ${current} use a ceriated or lanthanated tungsten.`
		};
	if (current === 'DCEP') return null;
	if (t.radioactive)
		return {
			...base,
			status: 'caution',
			message: `${t.classification} is thoriated: grinding dust is radioactive. Grind with local exhaust, or switch to ceriated or lanthanated.`
		};
	return { ...base, status: 'ok', message: `${t.classification} suits ${current}.` };
}

export const checkAmpsVsTungsten = guardCheck(checkAmpsVsTungstenUnguarded, null);
export const checkTungstenVsCurrent = guardCheck(checkTungstenVsCurrentUnguarded, null);
