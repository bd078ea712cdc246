import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const dir = mkdtempSync(join(tmpdir(), 'beadline-failed-sign-ins-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');

const { migrate } = await import('../db');
const { clearFailures, isLockedOut, recordFailure } = await import('./failed-sign-ins');
const { hits } = await import('../db/window-counters');

beforeAll(() => migrate());

// 10 failures in 15 minutes: the product's own limit (README, SECURITY.md §7), common practice, no source.
const WINDOW = 15 * 60_000;

describe('failed sign-ins per e-mail', () => {
	it('locks after 10 failures for 15 minutes, and success clears the count', async () => {
		const t = 1_000_000;
		for (let i = 0; i < 9; i++) expect(await recordFailure('a@x.example', t)).toBe(false);
		expect(await isLockedOut('a@x.example', t)).toBe(false);
		expect(await recordFailure('a@x.example', t)).toBe(true);
		expect(await isLockedOut('a@x.example', t)).toBe(true);
		expect(await isLockedOut('a@x.example', t + WINDOW)).toBe(true);
		expect(await isLockedOut('a@x.example', t + WINDOW + 1)).toBe(false);
		for (let i = 0; i < 5; i++) await recordFailure('b@x.example', t);
		await clearFailures('b@x.example');
		for (let i = 0; i < 9; i++) await recordFailure('b@x.example', t);
		expect(await isLockedOut('b@x.example', t)).toBe(false);
	});

	it('opens a new window at the first failure after the old one ended', async () => {
		const t = 5_000_000;
		for (let i = 0; i < 10; i++) await recordFailure('c@x.example', t);
		expect(await isLockedOut('c@x.example', t)).toBe(true);
		// One failure after the window: a count of one, not eleven.
		expect(await recordFailure('c@x.example', t + WINDOW + 1)).toBe(false);
		expect(await hits('failed-sign-in:c@x.example', t + WINDOW + 1)).toBe(1);
		expect(await isLockedOut('c@x.example', t + WINDOW + 1)).toBe(false);
	});

	it('counts every one of 40 failures recorded at once, and locks from the tenth', async () => {
		const t = Date.now();
		const locked = await Promise.all(
			Array.from({ length: 40 }, () => recordFailure('d@x.example', t))
		);
		expect(await hits('failed-sign-in:d@x.example', t)).toBe(40);
		// Each answer is the count its own hit made: exactly 31 of them saw 10 or more.
		expect(locked.filter(Boolean)).toHaveLength(31);
		expect(await isLockedOut('d@x.example', t)).toBe(true);
		// Another e-mail is untouched.
		expect(await isLockedOut('e@x.example', t)).toBe(false);
	});
});
