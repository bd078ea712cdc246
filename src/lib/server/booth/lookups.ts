// Booth link lookups: capped per address (the links are public, so nobody may walk the token
// space from one place) and logged, one row a lookup, outside the audit trail.
import type { RequestEvent } from '@sveltejs/kit';
import { col, fn, type InferCreationAttributes } from 'sequelize';
import { RateLimiter } from 'sveltekit-rate-limiter/server';
import { perMinute } from '../address-caps';
import { write } from '../db';
import { BoothLookup } from '../models';
import type { LookupOutcome } from '../models/booth-link';

/** A shop behind one address may have a dozen phones scanning: generous, but finite. */
export const boothLimiter = new RateLimiter({
	IP: [perMinute('BOOTH_LIMIT_IP_PER_MINUTE', 120, { liftableInTests: true }), 'm']
});

function addressOf(event: RequestEvent): string | null {
	try {
		return event.getClientAddress().slice(0, 64);
	} catch {
		return null;
	}
}

type Entry = Omit<InferCreationAttributes<BoothLookup>, 'id'>;
let pending: Entry[] = [];
let timer: ReturnType<typeof setTimeout> | null = null;

/** Writes the lookups gathered so far in one transaction. */
export async function flushLookups(): Promise<void> {
	if (timer) clearTimeout(timer);
	timer = null;
	const batch = pending;
	pending = [];
	if (!batch.length) return;
	try {
		await write((t) => BoothLookup.bulkCreate(batch, { transaction: t }));
	} catch (e) {
		console.error(`${batch.length} booth lookups not logged`, e);
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
	pending.push({
		...entry,
		userId: event.locals.user?.id ?? null,
		ip: addressOf(event),
		userAgent: event.request.headers.get('user-agent')?.slice(0, 300) ?? null,
		at: new Date()
	});
	if (pending.length >= 200) void flushLookups();
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
		attributes: ['linkId', [fn('COUNT', col('id')), 'count'], [fn('MAX', col('at')), 'last']],
		group: [col('link_id')],
		raw: true
	})) as unknown as { linkId: number; count: number; last: string | Date | null }[];
	for (const r of rows)
		out.set(r.linkId, { count: Number(r.count), last: r.last ? new Date(r.last) : null });
	return out;
}
