// 10,000 requests across the measured routes, one after another on each connection (autocannon
// cycles through the list), then the server's resident memory: what a day's traffic leaves.
import { readFileSync } from 'node:fs';
import autocannon from 'autocannon';
import type { Route } from './load';

export async function mixedRequests(
	origin: string,
	routes: Route[],
	amount = 10_000,
	connections = 10
): Promise<{ requests: number; non2xx: number; errors: number }> {
	const r = await autocannon({
		url: origin,
		amount,
		connections,
		requests: routes.map((x) => ({
			method: x.method ?? 'GET',
			path: x.path,
			headers: x.headers,
			body: x.body
		}))
	});
	return { requests: r.requests.total, non2xx: r.non2xx, errors: r.errors + r.timeouts };
}

export function memoryMb(pid: number): { afterMb: number; peakMb: number } {
	const status = readFileSync(`/proc/${pid}/status`, 'utf8');
	const kb = (key: string) => Number(new RegExp(`${key}:\\s+(\\d+)`).exec(status)?.[1] ?? NaN);
	return { afterMb: Math.round(kb('VmRSS') / 1024), peakMb: Math.round(kb('VmHWM') / 1024) };
}

/**
 * CPU time (user + system, ms) the process has used so far. On a shared machine a route's
 * req/s moves with the other work; the server's own CPU per request moves much less.
 */
export function cpuMs(pid: number): number {
	const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
	// Fields after the command name (which may hold spaces) start at field 3; utime, stime are 14, 15.
	const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
	return ((Number(fields[11]) + Number(fields[12])) * 1000) / 100;
}
