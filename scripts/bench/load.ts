// One autocannon run per route, all against the same server in one bench run, so each route can
// be set beside the bare endpoint (the framework's ceiling on this machine).
import autocannon from 'autocannon';

export interface Route {
	/** Short key the goals look the route up by. */
	id?: string;
	name: string;
	path: string;
	method?: 'GET' | 'POST';
	headers?: Record<string, string>;
	body?: string;
}

export interface LoadResult {
	id?: string;
	name: string;
	path: string;
	method: string;
	reqPerSec: number;
	p50Ms: number;
	p99Ms: number;
	requests: number;
	errors: number;
	non2xx: number;
	ratioToBare?: number;
}

export async function load(
	origin: string,
	route: Route,
	opts: { seconds: number; connections: number }
): Promise<LoadResult> {
	const r = await autocannon({
		url: origin + route.path,
		method: route.method ?? 'GET',
		headers: route.headers,
		body: route.body,
		duration: opts.seconds,
		connections: opts.connections
	});
	return {
		id: route.id,
		name: route.name,
		path: route.path,
		method: route.method ?? 'GET',
		reqPerSec: Math.round(r.requests.average),
		p50Ms: r.latency.p50,
		p99Ms: r.latency.p99,
		requests: r.requests.total,
		// Socket errors and timeouts, then answers that were not 2xx: both count against a route.
		errors: r.errors + r.timeouts,
		non2xx: r.non2xx
	};
}
