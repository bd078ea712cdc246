// Amperage rules of thumb: for the thickness, for the wire or rod size, and wire feed <-> amps.
import {
	GMAW_THICKNESS_TABLE,
	GMAW_WIRE_AMPS,
	GTAW_ROD_AMPS,
	GTAW_THICKNESS_RULE,
	SMAW_ELECTRODE_AMPS,
	WFS_PER_AMP_TABLE,
	WFS_TOLERANCE,
	type RodAmpRow
} from '$reference/wire-and-rod';
import type { Band, MetalFamily, Process, Source, Transfer } from '$reference/types';
import type { CheckContext } from './context';
import {
	bandStatus,
	expected,
	isNum,
	rangeText,
	sourceOf,
	type Finding,
	guardCheck
} from './findings';
import {
	formatLength,
	formatSpeed,
	MM_PER_IN,
	mmPerSToSpeed,
	ownKey,
	speedToMmPerS,
	type UnitSystem
} from './units';

export interface AmpBand {
	band: Band;
	source: Source;
	/** What the band is for, in words, e.g. "1/8 in carbon steel". */
	basis: string;
}

const FAMILY_WORDS: Record<MetalFamily, string> = {
	'carbon-steel': 'carbon steel',
	'low-alloy': 'low-alloy steel',
	stainless: 'stainless',
	aluminium: 'aluminium'
};

/** Largest gap (mm) between an entered diameter and a chart size still taken as that size. */
const SIZE_TOLERANCE_MM = 0.06;
const near = (mm: number, inches: number): boolean =>
	Math.abs(mm - inches * MM_PER_IN) <= SIZE_TOLERANCE_MM;

/**
 * Usual amps for a thickness. GTAW: 1 A per 0.001 in times the family factor, ±25 %, up to
 * 1/4 in. GMAW: the thickness band table up to 1/2 in (not aluminium). Null where no rule applies.
 */
export function thicknessAmpBand(
	process: Process,
	thicknessMm: number,
	family: MetalFamily = 'carbon-steel',
	system: UnitSystem = 'imperial'
): AmpBand | null {
	if (!isNum(thicknessMm) || thicknessMm <= 0 || !ownKey(FAMILY_WORDS, family)) return null;
	const inches = thicknessMm / MM_PER_IN;
	const basis = `${formatLength(thicknessMm, system)} ${FAMILY_WORDS[family]}`;
	if (process === 'GTAW') {
		const r = GTAW_THICKNESS_RULE;
		if (inches > r.maxThicknessIn + 1e-9) return null;
		const centre = inches * r.ampsPerInch * r.factor[family];
		const band = { min: Math.round(centre * (1 - r.band)), max: Math.round(centre * (1 + r.band)) };
		return { band, source: r.source, basis };
	}
	if (process === 'GMAW' && family !== 'aluminium') {
		const row = GMAW_THICKNESS_TABLE.rows.find((r) => inches <= r.upToIn + 1e-9);
		if (!row) return null;
		const f = family === 'stainless' ? GMAW_THICKNESS_TABLE.stainlessFactor : 1;
		return {
			band: { min: Math.round(row.amps.min * f), max: Math.round(row.amps.max * f) },
			source: GMAW_THICKNESS_TABLE.source,
			basis
		};
	}
	return null;
}

const rodBand = (rows: readonly RodAmpRow[], diameterMm: number): RodAmpRow | undefined =>
	rows.find((r) => near(diameterMm, r.diameterIn));

/**
 * Usual amps for a wire, rod or electrode diameter. GMAW picks the band for the transfer mode;
 * with globular or no mode given it spans short-circuit through spray.
 */
export function fillerAmpBand(
	process: Process,
	diameterMm: number,
	transfer?: Transfer,
	system: UnitSystem = 'imperial'
): AmpBand | null {
	if (!isNum(diameterMm) || diameterMm <= 0) return null;
	const size = formatLength(diameterMm, system);
	if (process === 'GMAW') {
		const row = GMAW_WIRE_AMPS.find((r) => near(diameterMm, r.diameterIn));
		if (!row) return null;
		const spray = transfer === 'spray' || transfer === 'pulsed-spray';
		if (transfer === 'short-circuit')
			return { band: row.shortCircuit, source: row.source, basis: `${size} wire, short-circuit` };
		if (spray && row.spray)
			return { band: row.spray, source: row.source, basis: `${size} wire, spray` };
		if (spray) return null;
		const band = { min: row.shortCircuit.min, max: row.spray?.max ?? row.shortCircuit.max };
		return { band, source: row.source, basis: `${size} wire` };
	}
	if (process === 'GTAW') {
		const row = rodBand(GTAW_ROD_AMPS, diameterMm);
		return row ? { band: row.amps, source: row.source, basis: `${size} filler rod` } : null;
	}
	if (process === 'SMAW') {
		const row = rodBand(SMAW_ELECTRODE_AMPS, diameterMm);
		return row
			? { band: row.amps, source: row.source, basis: `${size} E7018-type electrode` }
			: null;
	}
	return null;
}

/** Inches of wire per minute per amp for a GMAW wire, or null for sizes not in the table. */
export function wfsPerAmp(diameterMm: number): { inPerMinPerAmp: number; source: Source } | null {
	if (!isNum(diameterMm)) return null;
	const row = WFS_PER_AMP_TABLE.find((r) => r.diameterIn.some((d) => near(diameterMm, d)));
	return row ? { inPerMinPerAmp: row.inPerMinPerAmp, source: row.source } : null;
}

/** Wire feed speed (mm/s) to expect at an amperage, or null. */
export function wfsForAmps(diameterMm: number, amps: number): number | null {
	const k = wfsPerAmp(diameterMm);
	if (!k || !isNum(amps) || amps <= 0) return null;
	return speedToMmPerS(amps * k.inPerMinPerAmp, 'in/min');
}

/** Amperage to expect at a wire feed speed (mm/s), or null. */
export function ampsForWfs(diameterMm: number, wfsMmPerS: number): number | null {
	const k = wfsPerAmp(diameterMm);
	if (!k || !isNum(wfsMmPerS) || wfsMmPerS <= 0) return null;
	return mmPerSToSpeed(wfsMmPerS, 'in/min') / k.inPerMinPerAmp;
}

const WORDS = {
	ok: 'is within',
	low: { caution: 'is a little below', outside: 'is well below' },
	high: { caution: 'is a little above', outside: 'is well above' }
} as const;

/** "125 A is within the usual band for 1/8 in carbon steel (94–156 A)." */
export function ampsMessage(
	amps: number,
	band: Band,
	basis: string,
	status: Finding['status']
): string {
	if (!isNum(amps) || !band || !isNum(band.min) || !isNum(band.max)) return '';
	const where =
		status === 'ok' ? WORDS.ok : amps < band.min ? WORDS.low[status] : WORDS.high[status];
	return `${Math.round(amps * 10) / 10} A ${where} the usual band for ${basis} (${rangeText(`${band.min}`, `${band.max}`)} A).`;
}

function checkAmpsVsThicknessUnguarded(ctx: CheckContext): Finding | null {
	const { amps, thicknessMm, process } = ctx.s;
	if (!isNum(amps) || !isNum(thicknessMm)) return null;
	const b = thicknessAmpBand(process, thicknessMm, ctx.family ?? 'carbon-steel', ctx.system);
	if (!b) return null;
	const status = bandStatus(amps, b.band);
	return {
		check: 'amps-vs-thickness',
		status,
		message: ampsMessage(amps, b.band, b.basis, status),
		value: amps,
		expected: expected(b.band, 'A'),
		source: sourceOf(b.source),
		field: 'amps'
	};
}

function checkAmpsVsFillerUnguarded(ctx: CheckContext): Finding | null {
	const { amps, process, transfer } = ctx.s;
	const d = ctx.s.filler?.diameterMm;
	if (!isNum(amps) || !isNum(d)) return null;
	// The SMAW chart is for low-hydrogen (F-4) electrodes; other coverings run different currents.
	if (process === 'SMAW' && ctx.filler && ctx.filler.fNumber !== 4) return null;
	const b = fillerAmpBand(process, d, transfer, ctx.system);
	if (!b) return null;
	const status = bandStatus(amps, b.band);
	return {
		check: 'amps-vs-filler',
		status,
		message: ampsMessage(amps, b.band, b.basis, status),
		value: amps,
		expected: expected(b.band, 'A'),
		source: sourceOf(b.source),
		field: 'filler.diameter'
	};
}

function checkWfsVsAmpsUnguarded(ctx: CheckContext): Finding | null {
	const { amps, wireFeedMmPerS, process } = ctx.s;
	const d = ctx.s.filler?.diameterMm;
	if (process !== 'GMAW' || !isNum(amps) || !isNum(wireFeedMmPerS) || !isNum(d)) return null;
	const k = wfsPerAmp(d);
	const centre = ampsForWfs(d, wireFeedMmPerS);
	if (!k || centre === null) return null;
	const band = {
		min: Math.round(centre * (1 - WFS_TOLERANCE)),
		max: Math.round(centre * (1 + WFS_TOLERANCE))
	};
	const status = bandStatus(amps, band, 0);
	const wfs = formatSpeed(wireFeedMmPerS, ctx.system, 'wire');
	const size = formatLength(d, ctx.system);
	const message =
		status === 'ok'
			? `${amps} A fits ${wfs} on ${size} wire (about ${Math.round(centre)} A expected, ${band.min}–${band.max} A).`
			: `${wfs} on ${size} wire usually draws about ${Math.round(centre)} A (${band.min}–${band.max} A); ${amps} A is ${amps < band.min ? 'low' : 'high'}: check the wire size, stickout and the meter.`;
	return {
		check: 'wfs-vs-amps',
		status: status === 'outside' ? 'caution' : 'ok',
		message,
		value: amps,
		expected: expected(band, 'A'),
		source: sourceOf(k.source),
		field: 'wireFeed'
	};
}

export const checkAmpsVsThickness = guardCheck(checkAmpsVsThicknessUnguarded, null);
export const checkAmpsVsFiller = guardCheck(checkAmpsVsFillerUnguarded, null);
export const checkWfsVsAmps = guardCheck(checkWfsVsAmpsUnguarded, null);
