import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { isHttpError } from '@sveltejs/kit';
import { describe, expect, it } from 'vitest';

// The booth view's load with a low per-address limit (read when the limiter is made), so the
// decision and its log row are tested without sending 120 requests through a browser.
const dir = mkdtempSync(join(tmpdir(), 'beadline-booth-limit-'));
process.env.DATABASE_FILE = join(dir, 'test.sqlite');
process.env.UPLOADS_DIR = join(dir, 'uploads');
process.env.BOOTH_LIMIT_IP_PER_MINUTE = '3';

await (await import('../db')).migrate();
const { BoothLookup } = await import('../models');
const { flushLookups } = await import('./lookups');
const { load } = await import('../../../routes/b/[token]/+page.server');

/** What the load reads of a request: the token, the address, the user agent, no one signed in. */
function lookup(ip: string, token = 'not-a-token-of-any-sheet') {
	const url = new URL(`http://booth.test/b/${token}`);
	const event = {
		url,
		params: { token },
		locals: { user: null },
		request: new Request(url, { headers: { 'user-agent': 'booth phone' } }),
		getClientAddress: () => ip,
		setHeaders: () => {},
		cookies: { get: () => undefined, set: () => {} }
	};
	return (load as unknown as (e: typeof event) => Promise<unknown>)(event);
}

/** The HTTP status the load answered with (it throws SvelteKit's `error`). */
async function status(p: Promise<unknown>): Promise<number> {
	try {
		await p;
		return 200;
	} catch (e) {
		if (isHttpError(e)) return e.status;
		throw e;
	}
}

describe('the booth lookup limit', () => {
	it('turns an address away after its lookups a minute, logs that as limited, spares others', async () => {
		const ip = '198.51.100.23'; // RFC 5737 documentation address
		const answers: number[] = [];
		for (let i = 0; i < 5; i++) answers.push(await status(lookup(ip)));
		// 3 a minute (set above): the first three reach the token check (unknown: 404).
		expect(answers).toEqual([404, 404, 404, 429, 429]);
		// Another address behind the same sheet is still answered.
		expect(await status(lookup('198.51.100.24'))).toBe(404);

		await flushLookups();
		// One row per outcome for the address in this window, counting its lookups.
		const rows = await BoothLookup.findAll({ where: { ip }, order: [['outcome', 'DESC']] });
		expect(rows.map((r) => [r.outcome, r.hits])).toEqual([
			['unknown', 3],
			['limited', 2]
		]);
		expect(rows[1]).toMatchObject({
			shopId: null,
			linkId: null,
			userId: null,
			userAgent: 'booth phone'
		});
		expect(await BoothLookup.count({ where: { ip: '198.51.100.24', outcome: 'unknown' } })).toBe(1);
	});
});
