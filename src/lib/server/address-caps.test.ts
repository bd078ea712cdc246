import { describe, expect, it } from 'vitest';
import { perMinute, testCapsLifted, TEST_ONLY_LIFT } from './address-caps';

describe('address caps', () => {
	it('reads the operator setting, or the default', () => {
		expect(perMinute('X_PER_MINUTE', 30, { env: {} })).toBe(30);
		expect(perMinute('X_PER_MINUTE', 30, { env: { X_PER_MINUTE: '45' } })).toBe(45);
		for (const bad of ['0', '-3', 'lots', ''])
			expect(perMinute('X_PER_MINUTE', 30, { env: { X_PER_MINUTE: bad } })).toBe(30);
	});

	it('lifts a liftable cap only for a test server (NODE_ENV=test and the test-only setting)', () => {
		const lift = { [TEST_ONLY_LIFT]: '1' };
		expect(testCapsLifted({ ...lift, NODE_ENV: 'test' })).toBe(true);
		expect(
			perMinute('X', 30, { liftableInTests: true, env: { ...lift, NODE_ENV: 'test' } })
		).toBeGreaterThan(1e6);
		// Production ignores it: NODE_ENV production, or not set at all.
		for (const env of [
			{ ...lift, NODE_ENV: 'production' },
			{ ...lift },
			{ [TEST_ONLY_LIFT]: 'yes', NODE_ENV: 'test' }
		]) {
			expect(testCapsLifted(env)).toBe(false);
			expect(perMinute('X', 30, { liftableInTests: true, env })).toBe(30);
		}
		// A cap not marked liftable stays whatever the setting says.
		expect(perMinute('X', 30, { env: { ...lift, NODE_ENV: 'test' } })).toBe(30);
	});
});
