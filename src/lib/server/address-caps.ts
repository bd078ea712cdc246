// Per-address request caps (sign-in, invite and sign-up forms, booth links, card checks): a
// number a minute, set by the operator through an environment variable or left at its default.
//
// The end-to-end suite signs every test in from 127.0.0.1, where the sign-in, form and booth caps
// would throttle the suite, not an attacker. It lifts those with TEST_ONLY_LIFT_ADDRESS_CAPS=1,
// which counts only where NODE_ENV is "test": a production server (any other NODE_ENV, or none)
// ignores it, so a stray variable in a deployment cannot switch the caps off.

/** The name of the test-only setting; the e2e server and tests/support/own-server.ts set it. */
export const TEST_ONLY_LIFT = 'TEST_ONLY_LIFT_ADDRESS_CAPS';

/** A cap no test run reaches. */
const LIFTED = 1_000_000_000;

export function testCapsLifted(env: NodeJS.ProcessEnv = process.env): boolean {
	return env.NODE_ENV === 'test' && env[TEST_ONLY_LIFT] === '1';
}

export interface CapOptions {
	/** Whether the test-only lift applies (the caps every e2e sign-in would otherwise hit). */
	liftableInTests?: boolean;
	env?: NodeJS.ProcessEnv;
}

/** Requests a minute from one address: the variable `name` when it is a positive number, else `fallback`. */
export function perMinute(name: string, fallback: number, options: CapOptions = {}): number {
	const env = options.env ?? process.env;
	if (options.liftableInTests && testCapsLifted(env)) return LIFTED;
	const n = Number(env[name]);
	return Number.isFinite(n) && n > 0 ? n : fallback;
}
