import { describe, expect, it } from 'vitest';
import { clearFailures, isLockedOut, recordFailure } from './failed-sign-ins';

describe('failed sign-ins per e-mail', () => {
	it('locks after 10 failures for 15 minutes, and success clears the count', () => {
		const t = 1_000_000;
		for (let i = 0; i < 9; i++) recordFailure('a@x.example', t);
		expect(isLockedOut('a@x.example', t)).toBe(false);
		recordFailure('a@x.example', t);
		expect(isLockedOut('a@x.example', t)).toBe(true);
		expect(isLockedOut('a@x.example', t + 15 * 60_000 + 1)).toBe(false);
		for (let i = 0; i < 5; i++) recordFailure('b@x.example', t);
		clearFailures('b@x.example');
		for (let i = 0; i < 9; i++) recordFailure('b@x.example', t);
		expect(isLockedOut('b@x.example', t)).toBe(false);
	});
});
