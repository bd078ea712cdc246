import fc from 'fast-check';
import { expect, it } from 'vitest';
import * as weld from './index';

// This file holds no check values: those stand with their sources (ASME, AWS, OSHA, ISO, or
// "common practice, no source") in each module's own test beside it.

// "No function throws": every exported function, called with arbitrary arguments (numbers
// including NaN and Infinity, absurd strings, objects, arrays, null, undefined).
type AnyFunction = (...args: unknown[]) => unknown;
const functions = Object.entries(weld as Record<string, unknown>).filter(
	(e): e is [string, AnyFunction] => typeof e[1] === 'function'
);

it('exports functions to test', () => {
	expect(functions.length).toBeGreaterThan(50);
});

it.each(functions.map(([name, f]) => [name, f] as const))(
	'%s never throws (fast-check)',
	(_name, f) => {
		fc.assert(
			fc.property(
				fc.array(fc.oneof(fc.anything(), fc.double(), fc.string()), { maxLength: 4 }),
				(args) => {
					f(...args);
				}
			),
			{ numRuns: 40 }
		);
	}
);

// The values random generation rarely reaches: null where an options object is expected (a
// default parameter covers undefined only), objects with no prototype, symbols, bigints and
// names of Object.prototype members. Every function gets every combination of up to three.
const HOSTILE: unknown[] = [
	null,
	undefined,
	{},
	[],
	[null],
	NaN,
	-Infinity,
	-1,
	5e-324,
	'',
	'constructor',
	'__proto__',
	'imperial',
	Object.create(null),
	{ s: null, system: null },
	{ process: 'GMAW', amps: 'x', filler: null, gas: null, procedure: null, chemistry: null },
	Symbol('x'),
	10n
];

it.each(functions.map(([name, f]) => [name, f] as const))(
	'%s never throws on null, bare objects, symbols and bigints',
	(_name, f) => {
		const show = (a: unknown): string =>
			typeof a === 'object' && a !== null && Object.getPrototypeOf(a) === null
				? 'Object.create(null)'
				: typeof a === 'object'
					? JSON.stringify(a)
					: String(a);
		const call = (args: unknown[]): void => {
			expect(() => f(...args), `arguments ${args.map(show).join(', ')}`).not.toThrow();
			if (args.length < 3) for (const v of HOSTILE) call([...args, v]);
		};
		call([]);
	}
);
