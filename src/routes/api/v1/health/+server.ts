import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';

// Public and tiny on purpose: a probe for monitoring, and the bench's ceiling (the same server,
// hooks included, doing no work of its own). It reads nothing and tells nothing.
export const GET: RequestHandler = () =>
	json({ ok: true }, { headers: { 'Cache-Control': 'no-store' } });
