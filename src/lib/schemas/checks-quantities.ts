// The building blocks of the checks API's bodies: its choices, and `{ value, unit }` quantities
// capped to sane, finite SI ranges so absurd values come back as field errors, never a 500.
import { z } from 'zod';
import { flowToLPerMin, lengthToMm, speedToMmPerS, temperatureToC } from '$lib/weld/units';

export const PROCESSES = ['GTAW', 'GMAW', 'FCAW', 'SMAW'] as const;
export const CURRENTS = ['DCEN', 'DCEP', 'AC'] as const;
export const TRANSFERS = ['short-circuit', 'globular', 'spray', 'pulsed-spray'] as const;
export const FAMILIES = ['carbon-steel', 'stainless', 'aluminium'] as const;

export const list = (xs: readonly string[]) => xs.join(', ');

/** A `{ value, unit }` quantity whose SI value must fall in (min, max]. */
export function quantity<U extends string>(
	units: readonly [U, ...U[]],
	aliases: Record<string, U>,
	toSi: (value: number, unit: U) => number,
	si: { min: number; max: number; inclusiveMin?: boolean },
	tooBig: string
) {
	const unit = z.preprocess(
		(v) =>
			typeof v === 'string'
				? (aliases[v.trim()] ?? aliases[v.trim().toLowerCase()] ?? v.trim())
				: v,
		z.enum(units, { error: `Use one of: ${list(units)}.` })
	);
	const shape = `Give it as { "value": number, "unit": "${units[0]}" } (unit one of ${list(units)}).`;
	const object = z.object(
		{ value: z.number({ error: 'Give a number.' }), unit },
		{ error: (iss) => (iss.input === undefined ? `Required. ${shape}` : shape) }
	);
	return object.superRefine((q, ctx) => {
		const v = toSi(q.value, q.unit);
		const low = si.inclusiveMin ? v < si.min : v <= si.min;
		if (low)
			ctx.addIssue({
				code: 'custom',
				path: ['value'],
				message: si.min === 0 ? 'Must be more than zero.' : 'That value is too low.'
			});
		else if (v > si.max) ctx.addIssue({ code: 'custom', path: ['value'], message: tooBig });
	});
}

export const length = (maxMm: number, tooBig: string) =>
	quantity(
		['in', 'mm'],
		{ inch: 'in', inches: 'in', '"': 'in' },
		lengthToMm,
		{ min: 0, max: maxMm },
		tooBig
	);

export const speed = quantity(
	['in/min', 'mm/s', 'mm/min'],
	{ ipm: 'in/min', 'IN/MIN': 'in/min', 'mm/sec': 'mm/s' },
	speedToMmPerS,
	{ min: 0, max: speedToMmPerS(2000, 'in/min') },
	'Keep it at or under 2000 in/min (850 mm/s).'
);

export const flow = quantity(
	['CFH', 'L/min'],
	{ cfh: 'CFH', scfh: 'CFH', 'l/min': 'L/min', lpm: 'L/min' },
	flowToLPerMin,
	{ min: 0, max: flowToLPerMin(200, 'CFH') },
	'Keep it at or under 200 CFH (94 L/min).'
);

export const temperature = quantity(
	['degF', 'degC'],
	{ '°F': 'degF', '°C': 'degC', F: 'degF', C: 'degC', degf: 'degF', degc: 'degC' },
	temperatureToC,
	{ min: -60, max: 1000, inclusiveMin: true },
	'Keep it at or under 1832 °F (1000 °C).'
);

export const text = (max: number, what: string) =>
	z
		.string({ error: `Give the ${what} as text.` })
		.trim()
		.min(1, `Give the ${what}.`)
		.max(max, `Keep the ${what} under ${max} characters.`);

export const capped = (max: number, what: string) =>
	z
		.number({ error: `Give ${what} as a number.` })
		.gt(0, `${what[0]?.toUpperCase()}${what.slice(1)} must be more than zero.`)
		.max(max, `Keep ${what} at or under ${max}.`);

// QW-461.9 test positions (checked against the reference table in the tests), plus AWS 6GR.
export const POSITIONS = [
	'1G',
	'2G',
	'3G',
	'4G',
	'5G',
	'6G',
	'1F',
	'2F',
	'3F',
	'4F',
	'5F',
	'2FR',
	'6GR'
] as const;
