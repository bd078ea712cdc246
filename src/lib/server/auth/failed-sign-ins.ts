// Failed password attempts per e-mail. Only failures count, so a member who signs in often is
// never locked out, while guessing one account's password stops after MAX tries in the window.
const MAX = 10;
const WINDOW_MS = 15 * 60_000;
const CAP = 10_000;

const failures = new Map<string, { count: number; until: number }>();

export function isLockedOut(email: string, now = Date.now()): boolean {
	const f = failures.get(email);
	if (!f) return false;
	if (now > f.until) {
		failures.delete(email);
		return false;
	}
	return f.count >= MAX;
}

export function recordFailure(email: string, now = Date.now()): void {
	const f = failures.get(email);
	if (f && now <= f.until) f.count++;
	else failures.set(email, { count: 1, until: now + WINDOW_MS });
	// Oldest first in a Map: drop the stalest so a spray of e-mails cannot grow memory without end.
	while (failures.size > CAP) failures.delete(failures.keys().next().value as string);
}

export function clearFailures(email: string): void {
	failures.delete(email);
}
