// HTTP helpers of the bench: sign in as a person would (the sign-in form), and time requests one
// at a time for the latency-growth figures.
export async function signInCookie(
	origin: string,
	email: string,
	password: string
): Promise<string> {
	const res = await fetch(`${origin}/signin?/password`, {
		method: 'POST',
		redirect: 'manual',
		headers: { origin, accept: 'text/html', 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams({ email, password, redirectTo: '/' })
	});
	const cookie = res.headers
		.getSetCookie()
		.map((c) => c.split(';')[0]!)
		.find((c) => c.startsWith('authjs.session-token='));
	if (!cookie) throw new Error(`Sign-in as ${email} failed (HTTP ${res.status})`);
	return cookie;
}

export interface Timing {
	n: number;
	medianMs: number;
	p95Ms: number;
	p99Ms: number;
	status: number;
}

export const quantile = (sorted: number[], q: number) =>
	sorted.length ? sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))]! : NaN;

/** `n` requests one after another (after two warm-ups): what one person waits for. */
export async function timeSequential(
	url: string,
	headers: Record<string, string>,
	n: number
): Promise<Timing> {
	const ms: number[] = [];
	let status = 0;
	for (let i = -2; i < n; i++) {
		const t = performance.now();
		const res = await fetch(url, { headers, redirect: 'manual' });
		await res.arrayBuffer();
		if (i >= 0) ms.push(performance.now() - t);
		status = res.status;
	}
	ms.sort((a, b) => a - b);
	const round = (x: number) => Math.round(x * 10) / 10;
	return {
		n,
		medianMs: round(quantile(ms, 0.5)),
		p95Ms: round(quantile(ms, 0.95)),
		p99Ms: round(quantile(ms, 0.99)),
		status
	};
}

export async function waitFor(url: string, timeoutMs = 60_000): Promise<void> {
	const until = Date.now() + timeoutMs;
	while (Date.now() < until) {
		try {
			const res = await fetch(url);
			if (res.ok) return;
		} catch {
			// not listening yet
		}
		await new Promise((r) => setTimeout(r, 200));
	}
	throw new Error(`No answer from ${url} within ${timeoutMs / 1000} s`);
}
