import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { FC_SEED, fastCheckSeed } from './fast-check';

describe('fast-check seed', () => {
	it('replays the seed FC_SEED names', () => {
		expect(fastCheckSeed('730154556')).toBe(730154556);
		expect(fastCheckSeed(' -12 ')).toBe(-12);
	});
	it('draws a fresh whole-number seed when FC_SEED is missing or not a whole number', () => {
		for (const env of [undefined, '', 'abc', '1.5'])
			expect(Number.isInteger(fastCheckSeed(env))).toBe(true);
	});
	it('is the seed every property in the file runs from', () => {
		expect(fc.readConfigureGlobal().seed).toBe(FC_SEED);
	});
});
