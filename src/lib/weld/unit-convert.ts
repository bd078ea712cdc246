// Units: the SI the weld core stores (mm, A, V, mm/s, L/min, degC, J/mm) and exact conversions.
export type { UnitSystem } from './types';
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

export const finite = (n: unknown): n is number => typeof n === 'number' && Number.isFinite(n);

/** What is not a number counts as NaN: arithmetic on a symbol or a bare object would throw. */
const num = (x: unknown): number => (typeof x === 'number' ? x : NaN);

/**
 * True when `key` is one of the table's own keys. Looking anything else up ("constructor", a bare
 * object, a symbol) could read the prototype or throw; the weld core takes any input.
 */
export const ownKey = <T extends object>(table: T, key: unknown): key is keyof T =>
	typeof table === 'object' &&
	table !== null &&
	(typeof key === 'string' || typeof key === 'number') &&
	Object.hasOwn(table, key);

// ---- conversions (NaN in, NaN out; never a throw) ----

export const inToMm = (inches: number): number => num(inches) * MM_PER_IN;
export const mmToIn = (mm: number): number => num(mm) / MM_PER_IN;
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
const speedFactor = (unit: SpeedUnit): number =>
	ownKey(SPEED_MM_PER_S, unit) ? SPEED_MM_PER_S[unit] : NaN;
export const speedToMmPerS = (value: number, unit: SpeedUnit): number =>
	num(value) * speedFactor(unit);
export const mmPerSToSpeed = (mmPerS: number, unit: SpeedUnit): number =>
	num(mmPerS) / speedFactor(unit);

export const flowToLPerMin = (value: number, unit: FlowUnit): number =>
	unit === 'CFH' ? num(value) * LPM_PER_CFH : value;
export const lPerMinToFlow = (lPerMin: number, unit: FlowUnit): number =>
	unit === 'CFH' ? num(lPerMin) / LPM_PER_CFH : lPerMin;

export const fToC = (f: number): number => ((num(f) - 32) * 5) / 9;
export const cToF = (c: number): number => (num(c) * 9) / 5 + 32;
export const temperatureToC = (value: number, unit: TemperatureUnit): number =>
	unit === 'degF' ? fToC(value) : value;
export const cToTemperature = (c: number, unit: TemperatureUnit): number =>
	unit === 'degF' ? cToF(c) : c;
