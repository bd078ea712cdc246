import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { RateLimiter } from 'sveltekit-rate-limiter/server';

const dir = mkdtempSync(join(tmpdir(), 'beadline-rate-store-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');

const { migrate } = await import('../db');
const { DatabaseRateStore } = await import('./rate-store');
const { WindowCounter } = await import('../models');

beforeAll(() => migrate());

const from = (ip: string) => ({ getClientAddress: () => ip }) as unknown as RequestEvent;

describe('the rate limiter on the database store', () => {
	it('lets 5 a minute through per address, counts racing requests exactly, spares others', async () => {
		// Two limiters on one store name stand for two server processes on one database.
		const one = new RateLimiter({ IP: [5, 'm'], store: new DatabaseRateStore('t1') });
		const two = new RateLimiter({ IP: [5, 'm'], store: new DatabaseRateStore('t1') });
		const ip = '203.0.113.9'; // RFC 5737 documentation address
		const limited = await Promise.all(
			Array.from({ length: 12 }, (_, i) => (i % 2 ? one : two).isLimited(from(ip)))
		);
		expect(limited.filter((l) => !l)).toHaveLength(5);
		expect(await one.isLimited(from('203.0.113.10'))).toBe(false);
		// The address's one row holds every hit; the address itself is stored only as a hash.
		const rows = await WindowCounter.findAll({ where: {} });
		const mine = rows.filter((r) => r.key.startsWith('rate:t1:'));
		expect(mine.map((r) => r.hits).sort()).toEqual([1, 12]);
		expect(mine.some((r) => r.key.includes(ip))).toBe(false);
	});

	it('keeps limiters with other names apart, and clear() forgets only its own', async () => {
		const a = new RateLimiter({ IP: [1, 'm'], store: new DatabaseRateStore('t2') });
		const b = new RateLimiter({ IP: [1, 'm'], store: new DatabaseRateStore('t3') });
		const ev = from('203.0.113.20');
		expect(await a.isLimited(ev)).toBe(false);
		expect(await a.isLimited(ev)).toBe(true);
		expect(await b.isLimited(ev)).toBe(false);
		await a.clear();
		expect(await a.isLimited(ev)).toBe(false);
		expect(await b.isLimited(ev)).toBe(true);
	});
});
