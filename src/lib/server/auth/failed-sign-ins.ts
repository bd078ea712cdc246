// Failed password attempts per e-mail. Only failures count, so a member who signs in often is
// never locked out, while guessing one account's password stops after MAX tries in the window.
// The count is in the database (db/window-counters.ts), so a lockout earned through one server
// process holds on every other process on the same database.
import { hit, hits, reset } from '../db/window-counters';

const MAX = 10;
const WINDOW_MS = 15 * 60_000;

const keyOf = (email: string) => `failed-sign-in:${email}`;

export async function isLockedOut(email: string, now = Date.now()): Promise<boolean> {
	return (await hits(keyOf(email), now)) >= MAX;
}

/** Counts a failure; answers whether the account is locked out now. */
export async function recordFailure(email: string, now = Date.now()): Promise<boolean> {
	return (await hit(keyOf(email), WINDOW_MS, now)) >= MAX;
}

/** After a right password. */
export async function clearFailures(email: string): Promise<void> {
	await reset(keyOf(email));
}
