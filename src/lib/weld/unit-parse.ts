// Parsers for what people type: never throw, answer { ok: true, <si> } or { ok: false, message }.
import {
	AWG_RANGE,
	BWG_TUBE_IN,
	MSG_STEEL_IN,
	awgInches,
	type GaugeTable
} from '$reference/gauges';

import {
	finite,
	flowToLPerMin,
	inToMm,
	lengthToMm,
	speedToMmPerS,
	temperatureToC,
	type FlowUnit,
	type LengthUnit,
	type Parsed,
	type SpeedUnit,
	type TemperatureUnit
} from './unit-convert';

// ---- gauges ----

/** Sheet gauge to mm. Stainless sheet is refused: mills quote different tables for it. */
export function gaugeToMm(
	gauge: number,
	table: GaugeTable | 'stainless' = 'sheet-steel'
): Parsed<'mm'> {
	if (!finite(gauge) || !Number.isInteger(gauge))
		return { ok: false, message: 'A gauge is a whole number, e.g. 16 ga.' };
	if (table === 'stainless')
		return {
			ok: false,
			message:
				'Stainless sheet gauges differ between mills; enter the thickness in inches or mm instead.'
		};
	const inches =
		table === 'aluminium'
			? gauge >= AWG_RANGE.min && gauge <= AWG_RANGE.max
				? awgInches(gauge)
				: undefined
			: table === 'tube'
				? BWG_TUBE_IN[gauge]
				: MSG_STEEL_IN[gauge];
	if (inches === undefined) {
		const which =
			table === 'aluminium'
				? 'the aluminium (AWG) table, 0-40'
				: table === 'tube'
					? 'the tube wall (BWG) table, 8-26'
					: 'the sheet steel table, 3-30';
		return { ok: false, message: `${gauge} ga is not in ${which}.` };
	}
	return { ok: true, mm: inToMm(inches) };
}

// ---- parsing ----

const VULGAR: Record<string, string> = {
	'½': ' 1/2',
	'¼': ' 1/4',
	'¾': ' 3/4',
	'⅛': ' 1/8',
	'⅜': ' 3/8',
	'⅝': ' 5/8',
	'⅞': ' 7/8'
};

function clean(text: unknown): string | null {
	if (typeof text === 'number') return finite(text) ? String(text) : null;
	if (typeof text !== 'string' || text.length > 60) return null;
	let s = text.trim().toLowerCase();
	s = s.replace(/[½¼¾⅛⅜⅝⅞]/g, (c) => VULGAR[c] ?? c);
	s = s.replace(/[″”“]/g, '"').replace(/[′’]/g, "'").replace(/⁄/g, '/').replace(/[–—−]/g, '-');
	if (!s.includes('.') && /^[^,]*,[^,]*$/.test(s)) s = s.replace(',', '.');
	return s.replace(/\s+/g, ' ').trim();
}

type NumberForm = { value: number; fraction: boolean };

/** Reads "3", "0.125", ".5", "3/32", "1-1/2", "1 1/2" (and a leading minus). */
function readNumber(s: string): NumberForm | null {
	const t = s.trim();
	const neg = t.startsWith('-') ? -1 : 1;
	const body = neg < 0 ? t.slice(1).trim() : t;
	let m = /^(\d+)\s*(?:-|\s)\s*(\d+)\s*\/\s*(\d+)$/.exec(body);
	if (m) {
		const den = Number(m[3]);
		if (den === 0) return null;
		return { value: neg * (Number(m[1]) + Number(m[2]) / den), fraction: true };
	}
	m = /^(\d+)\s*\/\s*(\d+)$/.exec(body);
	if (m) {
		const den = Number(m[2]);
		if (den === 0) return null;
		return { value: (neg * Number(m[1])) / den, fraction: true };
	}
	if (/^(\d+(\.\d*)?|\.\d+)(e[+-]?\d+)?$/.test(body))
		return { value: neg * Number(body), fraction: false };
	return null;
}

/** Splits a trailing unit off against an alias table; longest aliases are tried first. */
function splitUnit<U extends string>(
	s: string,
	aliases: Record<string, U>
): { num: string; unit?: U } {
	const keys = Object.keys(aliases).sort((a, b) => b.length - a.length);
	for (const k of keys) {
		if (s.endsWith(k)) {
			const num = s.slice(0, s.length - k.length).trim();
			// "2in" is fine, but "ain" is not a number followed by "in".
			if (num === '' || /[\d.]$/.test(num)) return { num, unit: aliases[k] };
		}
	}
	return { num: s };
}

const LENGTH_ALIASES: Record<string, LengthUnit | 'ga'> = {
	mm: 'mm',
	millimeter: 'mm',
	millimeters: 'mm',
	millimetre: 'mm',
	millimetres: 'mm',
	in: 'in',
	'in.': 'in',
	inch: 'in',
	inches: 'in',
	'"': 'in',
	"''": 'in',
	ga: 'ga',
	gauge: 'ga',
	gage: 'ga'
};

export interface LengthOptions {
	/** Which gauge table "16 ga" refers to (default sheet steel). */
	gauge?: GaugeTable | 'stainless';
	/** Largest accepted value in mm (default 2540 mm, 100 in). */
	maxMm?: number;
}

const LENGTH_HINT = 'Enter a length such as 3/16, 0.188 in, 4.8 mm or 16 ga.';

/**
 * Parses a length. Fractions ("3/32", "1-1/2") are inches unless a unit says otherwise; a bare
 * decimal takes `defaultUnit`.
 */
export function parseLength(
	text: unknown,
	defaultUnit: LengthUnit = 'in',
	options: LengthOptions = {}
): Parsed<'mm'> {
	// Defaults apply to undefined only; a null or non-object options reads as none given.
	const opts: LengthOptions = options !== null && typeof options === 'object' ? options : {};
	const s = clean(text);
	if (s === null || s === '') return { ok: false, message: LENGTH_HINT };
	let { num, unit } = splitUnit(s, LENGTH_ALIASES);
	if (unit === undefined && num.startsWith('#')) {
		num = num.slice(1).trim();
		unit = 'ga';
	}
	const n = readNumber(num);
	if (n === null) return { ok: false, message: LENGTH_HINT };
	if (n.value <= 0) return { ok: false, message: 'A length must be more than zero.' };
	let mm: number;
	if (unit === 'ga') {
		if (n.fraction) return { ok: false, message: 'A gauge is a whole number, e.g. 16 ga.' };
		const g = gaugeToMm(n.value, opts.gauge ?? 'sheet-steel');
		if (!g.ok) return g;
		mm = g.mm;
	} else {
		mm = lengthToMm(n.value, unit ?? (n.fraction ? 'in' : defaultUnit));
	}
	const max = finite(opts.maxMm) ? opts.maxMm : 2540;
	if (!finite(mm) || mm > max)
		return {
			ok: false,
			message: `That is longer than Beadline accepts (${Math.round(max / 25.4)} in, ${Math.round(max)} mm).`
		};
	return { ok: true, mm };
}

const SPEED_ALIASES: Record<string, SpeedUnit> = {
	'in/min': 'in/min',
	'inch/min': 'in/min',
	'inches/min': 'in/min',
	'in per min': 'in/min',
	ipm: 'in/min',
	'mm/s': 'mm/s',
	'mm/sec': 'mm/s',
	'mm/min': 'mm/min',
	'cm/min': 'mm/min',
	'm/min': 'm/min',
	mpm: 'm/min'
};

/** Parses a travel or wire feed speed ("4 ipm", "1.7 mm/s", "5.1 m/min"). */
export function parseSpeed(text: unknown, defaultUnit: SpeedUnit = 'in/min'): Parsed<'mmPerS'> {
	const s = clean(text);
	const hint = 'Enter a speed such as 8 in/min, 3.4 mm/s or 200 mm/min.';
	if (s === null || s === '') return { ok: false, message: hint };
	const { num, unit } = splitUnit(s, SPEED_ALIASES);
	const n = readNumber(num);
	if (n === null) return { ok: false, message: hint };
	if (n.value <= 0) return { ok: false, message: 'A speed must be more than zero.' };
	// cm/min shares the mm/min entry; scale it here.
	const value = s.endsWith('cm/min') ? n.value * 10 : n.value;
	const mmPerS = speedToMmPerS(value, unit ?? defaultUnit);
	if (!finite(mmPerS) || mmPerS > speedToMmPerS(2000, 'in/min'))
		return { ok: false, message: 'That speed is above 2000 in/min (850 mm/s).' };
	return { ok: true, mmPerS };
}

const FLOW_ALIASES: Record<string, FlowUnit> = {
	cfh: 'CFH',
	scfh: 'CFH',
	'ft3/h': 'CFH',
	'ft³/h': 'CFH',
	'cu ft/h': 'CFH',
	'l/min': 'L/min',
	lpm: 'L/min',
	'litres/min': 'L/min',
	'liters/min': 'L/min',
	'litre/min': 'L/min',
	'liter/min': 'L/min'
};

/** Parses a gas flow ("20 CFH", "9.5 L/min"). */
export function parseFlow(text: unknown, defaultUnit: FlowUnit = 'CFH'): Parsed<'lPerMin'> {
	const s = clean(text);
	const hint = 'Enter a flow such as 20 CFH or 10 L/min.';
	if (s === null || s === '') return { ok: false, message: hint };
	const { num, unit } = splitUnit(s, FLOW_ALIASES);
	const n = readNumber(num);
	if (n === null) return { ok: false, message: hint };
	if (n.value <= 0) return { ok: false, message: 'A flow must be more than zero.' };
	const lPerMin = flowToLPerMin(n.value, unit ?? defaultUnit);
	if (!finite(lPerMin) || lPerMin > flowToLPerMin(200, 'CFH'))
		return { ok: false, message: 'That flow is above 200 CFH (94 L/min).' };
	return { ok: true, lPerMin };
}

const TEMP_ALIASES: Record<string, TemperatureUnit> = {
	'°f': 'degF',
	'º f': 'degF',
	'° f': 'degF',
	degf: 'degF',
	'deg f': 'degF',
	f: 'degF',
	fahrenheit: 'degF',
	'°c': 'degC',
	'° c': 'degC',
	degc: 'degC',
	'deg c': 'degC',
	c: 'degC',
	celsius: 'degC'
};

/** Parses a temperature ("150 °F", "65C"); negatives are allowed. */
export function parseTemperature(
	text: unknown,
	defaultUnit: TemperatureUnit = 'degF'
): Parsed<'degC'> {
	const s = clean(text);
	const hint = 'Enter a temperature such as 150 °F or 65 °C.';
	if (s === null || s === '') return { ok: false, message: hint };
	const { num, unit } = splitUnit(s, TEMP_ALIASES);
	const n = readNumber(num);
	if (n === null || n.fraction) return { ok: false, message: hint };
	const degC = temperatureToC(n.value, unit ?? defaultUnit);
	if (!finite(degC) || degC < -100 || degC > 1500)
		return { ok: false, message: 'That temperature is outside -148 to 2732 °F (-100 to 1500 °C).' };
	return { ok: true, degC };
}
