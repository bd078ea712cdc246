// A store for sveltekit-rate-limiter whose counts live in the database (db/window-counters.ts),
// so a limit holds across every server process on one database instead of per process. Same
// window as the package's own TTLStore: it opens at the first hit and lasts the rate's period.
// Each hit is one short write: right for sign-in and forms, too dear for the booth view (see
// booth/lookups.ts and the README's "Running more than one process").
import type { RateLimiterStore } from 'sveltekit-rate-limiter/server';
import { hit, reset } from '../db/window-counters';

export class DatabaseRateStore implements RateLimiterStore {
	/** `name` keeps the limiters apart in the one table. */
	constructor(private readonly name: string) {}

	add(hash: string, ttl: number): Promise<number> {
		return hit(`rate:${this.name}:${hash}`, ttl);
	}

	async clear(): Promise<void> {
		await reset(`rate:${this.name}:`, { prefix: true });
	}
}
