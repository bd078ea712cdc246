// Formatting in the user's system: inch fractions where they are common, mm as codes print them.
import {
	cToF,
	finite,
	lPerMinToFlow,
	mmPerSToSpeed,
	mmToIn,
	type UnitSystem
} from './unit-convert';

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
	if (!finite(mm)) return NaN;
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
