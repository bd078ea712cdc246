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
