// Units: the SI the weld core stores (mm, A, V, mm/s, L/min, degC, J/mm) and exact conversions.
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

export const finite = (n: unknown): n is number => typeof n === 'number' && Number.isFinite(n);

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
