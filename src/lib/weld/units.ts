// Quantities: stored SI (mm, A, V, mm/s, L/min, degC, J/mm), shown in the user's system.
// Parsers never throw: they answer { ok: true, <si> } or { ok: false, message }.
import {
	AWG_RANGE,
	BWG_TUBE_IN,
	MSG_STEEL_IN,
	awgInches,
	type GaugeTable
} from '$reference/gauges';

export type { GaugeTable };
export type UnitSystem = 'imperial' | 'metric';
export type LengthUnit = 'in' | 'mm';
export type SpeedUnit = 'in/min' | 'mm/s' | 'mm/min' | 'm/min';
export type FlowUnit = 'CFH' | 'L/min';
export type TemperatureUnit = 'degF' | 'degC';

/** Exact by definition (NIST Handbook 44; 16 CFR 500.19). */
export const MM_PER_IN = 25.4;
/** 1 ft3/h in L/min, from the exact inch: 304.8^3 mm3 / 1e6 / 60 = 0.4719474432. */
export const LPM_PER_CFH = 304.8 ** 3 / 1e6 / 60;

export type Parsed<K extends string> =
	({ ok: true } & { [P in K]: number }) | { ok: false; message: string };

const finite = (n: unknown): n is number => typeof n === 'number' && Number.isFinite(n);

// ---- conversions (NaN in, NaN out; never a throw) ----

export const inToMm = (inches: number): number => inches * MM_PER_IN;
export const mmToIn = (mm: number): number => mm / MM_PER_IN;
export const lengthToMm = (value: number, unit: LengthUnit): number =>
	unit === 'in' ? inToMm(value) : value;
export const mmToLength = (mm: number, unit: LengthUnit): number =>
	unit === 'in' ? mmToIn(mm) : mm;

const SPEED_MM_PER_S: Record<SpeedUnit, number> = {
	'in/min': MM_PER_IN / 60,
	'mm/s': 1,
	'mm/min': 1 / 60,
	'm/min': 1000 / 60
};
export const speedToMmPerS = (value: number, unit: SpeedUnit): number =>
	value * SPEED_MM_PER_S[unit];
export const mmPerSToSpeed = (mmPerS: number, unit: SpeedUnit): number =>
	mmPerS / SPEED_MM_PER_S[unit];

export const flowToLPerMin = (value: number, unit: FlowUnit): number =>
	unit === 'CFH' ? value * LPM_PER_CFH : value;
export const lPerMinToFlow = (lPerMin: number, unit: FlowUnit): number =>
	unit === 'CFH' ? lPerMin / LPM_PER_CFH : lPerMin;

export const fToC = (f: number): number => ((f - 32) * 5) / 9;
export const cToF = (c: number): number => (c * 9) / 5 + 32;
export const temperatureToC = (value: number, unit: TemperatureUnit): number =>
	unit === 'degF' ? fToC(value) : value;
export const cToTemperature = (c: number, unit: TemperatureUnit): number =>
	unit === 'degF' ? cToF(c) : c;

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
		const g = gaugeToMm(n.value, options.gauge ?? 'sheet-steel');
		if (!g.ok) return g;
		mm = g.mm;
	} else {
		mm = lengthToMm(n.value, unit ?? (n.fraction ? 'in' : defaultUnit));
	}
	const max = options.maxMm ?? 2540;
	if (!finite(mm) || mm > max)
		return {
			ok: false,
			message: `That is longer than Beadline accepts (${formatLength(max, unit === 'mm' ? 'metric' : 'imperial')}).`
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

// ---- formatting ----

const trimZeros = (s: string): string => (s.includes('.') ? s.replace(/\.?0+$/, '') : s);
const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

/** Denominator step for a size: 1/64 below 1/8 in, 1/32 below 1/2 in, else 1/16. */
const stepFor = (inches: number): number => (inches < 1 / 8 ? 64 : inches < 1 / 2 ? 32 : 16);

function fractionText(whole: number, num: number, den: number): string {
	if (num === 0) return String(whole);
	const g = gcd(num, den);
	const f = `${num / g}/${den / g}`;
	return whole > 0 ? `${whole}-${f}` : f;
}

/** Decimal inches as printed: 3 places under 1 in, else 2 (trailing zeros dropped above 1 in). */
const decimalInches = (inches: number): number =>
	inches < 1 ? Math.round(inches * 1000) / 1000 : Math.round(inches * 100) / 100;

/**
 * The nearest common fraction when the value is one, or sits within 1 % (and 1/128 in) of one;
 * null otherwise. The test runs on the printed decimal so that re-reading a printed value gives
 * the same text again.
 */
export function inchFraction(inches: number): string | null {
	if (!finite(inches) || inches <= 0 || inches > 1000) return null;
	const near = (v: number, tolerance: number): string | null => {
		const den = stepFor(v);
		const n = Math.round(v * den);
		if (n === 0 || Math.abs(v - n / den) > tolerance) return null;
		return fractionText(Math.floor(n / den), n % den, den);
	};
	const d = decimalInches(inches);
	return near(inches, 1e-9) ?? near(d, Math.min(0.01 * d, 1 / 128) + 1e-12);
}

export function formatInches(inches: number): string {
	if (!finite(inches)) return '–';
	const f = inchFraction(inches);
	if (f !== null) return `${f} in`;
	const d = decimalInches(inches);
	return `${inches < 1 ? d.toFixed(3) : trimZeros(d.toFixed(2))} in`;
}

/** mm the way codes print them: 0.1 mm under 10 mm (3/32 in -> 2.4 mm), whole mm above. */
export function roundMm(mm: number): number {
	if (mm < 0.1) return Math.round(mm * 100) / 100;
	return mm < 10 ? Math.round(mm * 10) / 10 : Math.round(mm);
}

export function formatMm(mm: number): string {
	return finite(mm) ? `${trimZeros(String(roundMm(mm)))} mm` : '–';
}

export const formatLength = (mm: number, system: UnitSystem): string =>
	system === 'imperial' ? formatInches(mmToIn(mm)) : formatMm(mm);

const oneDecimalUnder10 = (v: number): string =>
	trimZeros(Math.abs(v) < 10 ? v.toFixed(1) : v.toFixed(0));

export function formatFlow(lPerMin: number, system: UnitSystem): string {
	if (!finite(lPerMin)) return '–';
	return system === 'imperial'
		? `${oneDecimalUnder10(lPerMinToFlow(lPerMin, 'CFH'))} CFH`
		: `${oneDecimalUnder10(lPerMin)} L/min`;
}

/** Travel speed shows mm/min in metric; wire feed shows m/min, as WPS forms print them. */
export function formatSpeed(
	mmPerS: number,
	system: UnitSystem,
	kind: 'travel' | 'wire' = 'travel'
): string {
	if (!finite(mmPerS)) return '–';
	if (system === 'imperial') return `${oneDecimalUnder10(mmPerSToSpeed(mmPerS, 'in/min'))} in/min`;
	if (kind === 'wire') {
		const m = mmPerSToSpeed(mmPerS, 'm/min');
		return `${trimZeros(m.toFixed(m < 0.1 ? 3 : m < 1 ? 2 : 1))} m/min`;
	}
	return `${Math.round(mmPerSToSpeed(mmPerS, 'mm/min'))} mm/min`;
}

export function formatTemperature(degC: number, system: UnitSystem): string {
	if (!finite(degC)) return '–';
	const v = Math.round(system === 'imperial' ? cToF(degC) : degC);
	return `${v === 0 ? 0 : v} °${system === 'imperial' ? 'F' : 'C'}`;
}

/** The display unit of each kind for a system. */
export const displayUnits = (system: UnitSystem) =>
	system === 'imperial'
		? ({ length: 'in', speed: 'in/min', flow: 'CFH', temperature: 'degF' } as const)
		: ({ length: 'mm', speed: 'mm/min', flow: 'L/min', temperature: 'degC' } as const);
