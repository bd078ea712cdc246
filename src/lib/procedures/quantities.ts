// Reads the text of one range end ("3/32", "8 in/min", "150 °F") into SI with the weld core's
// parsers, and prints SI back as text those parsers read again. Bare numbers take the units of
// the reader's system.
import {
	formatFlow,
	formatInches,
	formatLength,
	formatMm,
	formatSpeed,
	formatTemperature,
	MM_PER_IN,
	mmToIn,
	parseFlow,
	parseLength,
	parseSpeed,
	parseTemperature,
	type UnitSystem
} from '$lib/weld';

export type QuantityKind =
	| 'amps'
	| 'volts'
	| 'thickness'
	| 'diameter'
	| 'travel'
	| 'wire'
	| 'flow'
	| 'temperature'
	| 'heatInput';

export type Read = { ok: true; value: number } | { ok: false; message: string };

function plain(text: string, unit: string, min: number, max: number, what: string): Read {
	const m = new RegExp(`^(\\d+(?:[.,]\\d+)?)\\s*(?:${unit})?$`, 'i').exec(text.trim());
	const n = m?.[1] ? Number(m[1].replace(',', '.')) : NaN;
	if (!Number.isFinite(n)) return { ok: false, message: `Enter the ${what} as a number.` };
	if (n < min || n > max) return { ok: false, message: `Enter ${what} between ${min} and ${max}.` };
	return { ok: true, value: n };
}

/** J/mm from "25 kJ/in" (imperial) or "1.2 kJ/mm" (metric); bare numbers in those units. */
function heatInput(text: string, system: UnitSystem): Read {
	const m = /^(\d+(?:[.,]\d+)?)\s*(kj\/in|kj\/mm|j\/in|j\/mm)?$/i.exec(text.trim());
	const n = m?.[1] ? Number(m[1].replace(',', '.')) : NaN;
	if (!Number.isFinite(n) || n <= 0)
		return { ok: false, message: 'Enter a heat input such as 45 kJ/in or 1.8 kJ/mm.' };
	const unit = (m?.[2] ?? (system === 'imperial' ? 'kj/in' : 'kj/mm')).toLowerCase();
	const perMm = unit.endsWith('/in') ? n / MM_PER_IN : n;
	return { ok: true, value: unit.startsWith('kj') ? perMm * 1000 : perMm };
}

export function readQuantity(kind: QuantityKind, text: string, system: UnitSystem): Read {
	const metric = system === 'metric';
	const wrap = (
		r: { ok: true; [k: string]: unknown } | { ok: false; message: string },
		key: string
	): Read => (r.ok ? { ok: true, value: r[key] as number } : r);
	switch (kind) {
		case 'amps':
			return plain(text, 'a', 1, 1000, 'amps');
		case 'volts':
			return plain(text, 'v', 1, 80, 'volts');
		case 'thickness':
			return wrap(parseLength(text, metric ? 'mm' : 'in'), 'mm');
		case 'diameter':
			return wrap(parseLength(text, metric ? 'mm' : 'in', { maxMm: 13 }), 'mm');
		case 'travel':
			return wrap(parseSpeed(text, metric ? 'mm/min' : 'in/min'), 'mmPerS');
		case 'wire':
			return wrap(parseSpeed(text, metric ? 'm/min' : 'in/min'), 'mmPerS');
		case 'flow':
			return wrap(parseFlow(text, metric ? 'L/min' : 'CFH'), 'lPerMin');
		case 'temperature':
			return wrap(parseTemperature(text, metric ? 'degC' : 'degF'), 'degC');
		case 'heatInput':
			return heatInput(text, system);
	}
}

const tidy = (n: number, places: number) => String(Math.round(n * 10 ** places) / 10 ** places);

/** SI to text in the reader's units, readable by readQuantity again. */
export function showQuantity(kind: QuantityKind, si: number, system: UnitSystem): string {
	switch (kind) {
		case 'amps':
			return `${tidy(si, 0)} A`;
		case 'volts':
			return `${tidy(si, 1)} V`;
		case 'thickness':
		case 'diameter':
			return system === 'imperial' ? formatInches(mmToIn(si)) : formatMm(si);
		case 'travel':
			return formatSpeed(si, system, 'travel');
		case 'wire':
			return formatSpeed(si, system, 'wire');
		case 'flow':
			return formatFlow(si, system);
		case 'temperature':
			return formatTemperature(si, system);
		case 'heatInput':
			return system === 'imperial'
				? `${tidy((si * MM_PER_IN) / 1000, 1)} kJ/in`
				: `${tidy(si / 1000, 2)} kJ/mm`;
	}
}

export { formatLength };
