import type { RequestHandler } from './$types';

// Public and tiny on purpose: a probe for monitoring, and the bench's ceiling (the same server,
// hooks included, doing no work of its own). It reads nothing and tells nothing. The body and its
// headers are made once: Kit's json() would stringify and measure the same eleven bytes each time.
const BODY = JSON.stringify({ ok: true });
const HEADERS = {
	'content-type': 'application/json',
	'content-length': String(Buffer.byteLength(BODY)),
	'cache-control': 'no-store'
};

export const GET: RequestHandler = () => new Response(BODY, { headers: HEADERS });
