// Booth link lookups: capped per address (the links are public, so nobody may walk the token
// space from one place) and logged, one row per link and window, outside the audit trail.
// The per-address cap is kept in each process's memory, not in the database: the booth view is
// the busiest public page, a database write per scan would cost more than the cap protects, and
// with N processes an address gets at most N times the cap (README, "Running more than one
// process").
import type { RequestEvent } from '@sveltejs/kit';
import { col, fn, Op, type InferCreationAttributes } from 'sequelize';
import { RateLimiter } from 'sveltekit-rate-limiter/server';
import { perMinute } from '../address-caps';
import { write } from '../db';
import { BoothLookup } from '../models';
import type { LookupOutcome } from '../models/booth-link';
import { LOOKUP_WINDOW_MS } from './lookup-window';

export { LOOKUP_WINDOW_MS };

/** A shop behind one address may have a dozen phones scanning: generous, but finite. */
export const boothLimiter = new RateLimiter({
	IP: [perMinute('BOOTH_LIMIT_IP_PER_MINUTE', 120, { liftableInTests: true }), 'm'],
	// The key is the address itself: it stays in this process's memory (never stored or sent),
	// and the library's default SHA-256 of it was some 5 % of a signed-out scan's CPU.
	hashFunction: (key) => key
});

function addressOf(event: RequestEvent): string | null {
	try {
		return event.getClientAddress().slice(0, 64);
	} catch {
		return null;
	}
}

// One row per link and outcome per window (LOOKUP_WINDOW_MS), whichever process served the scan:
// a 50-tap burst on one sheet is one row that counts 50. Unknown and limited lookups have no
// link, so their rows are per address instead (someone walking the token space is one address).

type Entry = Omit<InferCreationAttributes<BoothLookup>, 'id'> & {
	bucket: string;
	windowStart: number;
	hits: number;
	lastAt: Date;
};
let pending = new Map<string, Entry>();
let timer: ReturnType<typeof setTimeout> | null = null;

/**
 * Writes the lookups gathered so far in one transaction. Each window's row is inserted if no
 * process has made it yet (`ignoreDuplicates`: INSERT OR IGNORE on SQLite, ON CONFLICT DO NOTHING
 * on PostgreSQL, against the unique index on bucket and window), then its count goes up by this
 * process's lookups in one `hits = hits + n`. Rows are taken in one order so two processes
 * flushing the same windows never wait on each other in a circle.
 */
export async function flushLookups(): Promise<void> {
	if (timer) clearTimeout(timer);
	timer = null;
	const batch = [...pending.entries()].sort(([a], [b]) => (a < b ? -1 : 1)).map(([, e]) => e);
	pending = new Map();
	if (!batch.length) return;
	try {
		await write(
			async (t) => {
				await BoothLookup.bulkCreate(
					batch.map((e) => ({ ...e, hits: 0, lastAt: null })),
					{ ignoreDuplicates: true, transaction: t }
				);
				for (const e of batch) {
					const where = { bucket: e.bucket, windowStart: e.windowStart };
					await BoothLookup.increment({ hits: e.hits }, { where, transaction: t });
					await BoothLookup.update(
						{ lastAt: e.lastAt },
						{
							where: { ...where, [Op.or]: [{ lastAt: null }, { lastAt: { [Op.lt]: e.lastAt } }] },
							transaction: t
						}
					);
				}
			},
			{ atomicStatements: true }
		);
	} catch (e) {
		const n = batch.reduce((sum, b) => sum + b.hits, 0);
		console.error(`${n} booth lookups not logged`, e);
	}
}

/**
 * Best effort and batched: a posted sheet is scanned all day, so lookups are gathered for half a
 * second and written together instead of taking the write lock once each. A lookup that cannot be
 * logged is still answered.
 */
export function logLookup(
	event: RequestEvent,
	entry: { shopId: number | null; linkId: number | null; outcome: LookupOutcome }
): void {
	const at = new Date();
	const ip = addressOf(event);
	const bucket =
		entry.linkId == null
			? `${entry.outcome}:${ip ?? '-'}`
			: `link:${entry.linkId}:${entry.outcome}`;
	const windowStart = Math.floor(at.getTime() / LOOKUP_WINDOW_MS) * LOOKUP_WINDOW_MS;
	const key = `${bucket}|${windowStart}`;
	const seen = pending.get(key);
	if (seen) {
		seen.hits++;
		seen.lastAt = at;
	} else
		pending.set(key, {
			...entry,
			userId: event.locals.user?.id ?? null,
			ip,
			userAgent: event.request.headers.get('user-agent')?.slice(0, 300) ?? null,
			at,
			bucket,
			windowStart,
			hits: 1,
			lastAt: at
		});
	if (pending.size >= 200) void flushLookups();
	else if (!timer) {
		timer = setTimeout(() => void flushLookups(), 500);
		timer.unref?.();
	}
}

/** How often each link of a shop was looked up, and when last. */
export async function lookupCounts(
	shopId: number,
	linkIds: number[]
): Promise<Map<number, { count: number; last: Date | null }>> {
	await flushLookups();
	const out = new Map<number, { count: number; last: Date | null }>();
	if (!linkIds.length) return out;
	const rows = (await BoothLookup.findAll({
		where: { shopId, linkId: linkIds },
		attributes: [
			'linkId',
			[fn('SUM', col('hits')), 'count'],
			[fn('MAX', fn('COALESCE', col('last_at'), col('at'))), 'last']
		],
		group: [col('link_id')],
		raw: true
	})) as unknown as { linkId: number; count: number; last: string | Date | null }[];
	for (const r of rows)
		out.set(r.linkId, { count: Number(r.count), last: r.last ? new Date(r.last) : null });
	return out;
}
