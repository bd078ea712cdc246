// Hostile input for the fuzz tests, with fast-check: strings that break parsers, databases and
// pages, values of the wrong type, prototype-pollution keys, and payloads shaped like a zod schema
// (its own keys and enums) with any of those in any field, so validation is reached at depth.
import fc from 'fast-check';
import type { z } from 'zod';

export const POLLUTION_KEYS = ['__proto__', 'constructor', 'prototype'];

const NASTY = [
	"' OR 1=1 --",
	'"; DROP TABLE settings_records; --',
	'<script>alert(1)</script>',
	'<img src=x onerror=alert(1)>',
	'{{7*7}}${7*7}',
	'../../../../etc/passwd',
	'..\\..\\windows\\win.ini',
	'%00',
	'\u0000',
	'\u202e\u0645\u0631\u062d\u0628\u0627',
	'\u200b\u200d\ufeff',
	'𝔘𝔫𝔦𝔠𝔬𝔡𝔢 👩🏽‍🏭🔥',
	'NaN',
	'Infinity',
	'-0',
	'1e309',
	'0x1F',
	'3/0',
	'1/8/16',
	'-1',
	'9'.repeat(400),
	'',
	' ',
	'null',
	'true',
	'[object Object]'
];

export const hostileString: fc.Arbitrary<string> = fc.oneof(
	{ weight: 4, arbitrary: fc.constantFrom(...NASTY) },
	{ weight: 2, arbitrary: fc.string({ unit: 'grapheme', maxLength: 60 }) },
	{ weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 40 }) },
	// Oversize: past every field's limit (the fuzz test sends a megabyte once per target too).
	{ weight: 1, arbitrary: fc.nat({ max: 20_000 }).map((n) => 'x'.repeat(n + 5_000)) },
	{ weight: 1, arbitrary: fc.tuple(fc.constantFrom(...NASTY), fc.string()).map(([a, b]) => a + b) }
);

export const hostileScalar: fc.Arbitrary<unknown> = fc.oneof(
	hostileString,
	fc.integer(),
	fc.double(),
	fc.constantFrom(Number.MAX_SAFE_INTEGER, -Number.MAX_SAFE_INTEGER, 1e308, -1e308, 0, -1),
	fc.boolean(),
	fc.constant(null)
);

/** Any JSON: nested arrays and objects, with pollution keys among the ordinary ones. */
export const hostileJson: fc.Arbitrary<unknown> = fc.letrec<{ v: unknown }>((tie) => ({
	v: fc.oneof(
		{ depthSize: 'small', withCrossShrink: true },
		hostileScalar,
		fc.array(tie('v'), { maxLength: 5 }),
		fc.dictionary(
			fc.oneof(fc.constantFrom(...POLLUTION_KEYS), fc.string({ maxLength: 12 })),
			tie('v'),
			{ maxKeys: 5 }
		)
	)
})).v;

type Def = { type: string; [k: string]: unknown };
const defOf = (s: unknown): Def => (s as { _zod: { def: Def } })._zod.def;

/** The schema under wrappers (default, optional, pipes from preprocess or transform, catch…). */
function unwrap(schema: z.ZodType): z.ZodType {
	let s = schema;
	for (let i = 0; i < 20; i++) {
		const d = defOf(s);
		if (
			['default', 'optional', 'nullable', 'catch', 'readonly', 'prefault', 'nonoptional'].includes(
				d.type
			)
		)
			s = d.innerType as z.ZodType;
		else if (d.type === 'pipe') {
			const inner = defOf(d.in);
			s = (inner.type === 'transform' ? d.out : d.in) as z.ZodType;
		} else if (d.type === 'lazy') s = (d.getter as () => z.ZodType)();
		else return s;
	}
	return s;
}

/**
 * Values shaped by `schema`: its keys and enum members, plausible values of the right type, and
 * hostile ones in any place. Depth-limited so recursive schemas end.
 */
export function fromSchema(schema: z.ZodType, depth = 0): fc.Arbitrary<unknown> {
	const s = unwrap(schema);
	const d = defOf(s);
	const hostile = depth > 3 ? hostileScalar : fc.oneof(hostileScalar, hostileJson);
	let typed: fc.Arbitrary<unknown>;
	switch (d.type) {
		case 'object': {
			const shape = d.shape as Record<string, z.ZodType>;
			const fields = Object.fromEntries(
				Object.entries(shape).map(([k, v]) => [k, fromSchema(v, depth + 1)])
			);
			typed = fc
				.tuple(
					fc.record(fields, { requiredKeys: [] }),
					fc.dictionary(fc.constantFrom(...POLLUTION_KEYS), hostileJson, { maxKeys: 2 })
				)
				.map(([a, b]) => ({ ...a, ...b }));
			break;
		}
		case 'array':
			typed = fc.array(fromSchema(d.element as z.ZodType, depth + 1), { maxLength: 4 });
			break;
		case 'enum':
			typed = fc.constantFrom(...Object.values(d.entries as Record<string, string>));
			break;
		case 'literal':
			typed = fc.constantFrom(...(d.values as unknown[]));
			break;
		case 'union':
			typed = fc.oneof(...(d.options as z.ZodType[]).map((o) => fromSchema(o, depth + 1)));
			break;
		case 'record':
			typed = fc.dictionary(
				fc.string({ maxLength: 10 }),
				fromSchema(d.valueType as z.ZodType, depth + 1),
				{
					maxKeys: 4
				}
			);
			break;
		case 'number':
		case 'int':
			typed = fc.oneof(fc.integer({ min: -5, max: 500 }), fc.double({ noNaN: true }));
			break;
		case 'boolean':
			typed = fc.boolean();
			break;
		case 'string':
			typed = fc.oneof(
				fc.string({ maxLength: 20 }),
				fc.constantFrom('1/8', '3/32 in', '125', 'GTAW')
			);
			break;
		default:
			typed = hostileScalar;
	}
	return fc.oneof({ weight: 3, arbitrary: typed }, { weight: 1, arbitrary: hostile });
}

/** Form fields (strings only, as a browser sends them) under the given names, plus strangers. */
export function formFields(names: string[]): fc.Arbitrary<[string, string][]> {
	const name = fc.oneof(
		{ weight: 5, arbitrary: fc.constantFrom(...(names.length ? names : ['x'])) },
		{ weight: 1, arbitrary: fc.constantFrom(...POLLUTION_KEYS, '__superform_id', 'a[b]', '') }
	);
	return fc.array(fc.tuple(name, hostileString), { minLength: 1, maxLength: 12 });
}
