// Requests for the many-processes test: through the cluster's proxy by default, or straight to
// one process (`base`), always with the public origin the processes were given (CSRF check).
import type { Cluster } from './app-cluster';

/** Polls `probe` until it answers something truthy, for at most `ms`. */
export async function until<T>(
	what: string,
	probe: () => Promise<T>,
	ms = 20_000
): Promise<NonNullable<T>> {
	const end = Date.now() + ms;
	for (;;) {
		const v = await probe();
		if (v) return v as NonNullable<T>;
		if (Date.now() > end) throw new Error(`Timed out after ${ms} ms waiting for ${what}`);
		await new Promise((r) => setTimeout(r, 100));
	}
}

export function clusterHttp(cluster: () => Cluster) {
	const send = (base: string | undefined, path: string, cookie: string, init: RequestInit) => {
		const origin = cluster().proxy.origin;
		return fetch((base ?? origin) + path, {
			redirect: 'manual',
			...init,
			headers: { cookie, origin, ...(init.headers as Record<string, string>) }
		});
	};
	return {
		postJson: (path: string, cookie: string, body: unknown, base?: string) =>
			send(base, path, cookie, {
				method: 'POST',
				headers: { 'content-type': 'application/json' },
				body: JSON.stringify(body)
			}),
		/** A form post as a browser sends it without JavaScript (SvelteKit answers with HTML). */
		postForm: (
			path: string,
			cookie: string,
			fields: Record<string, string> | FormData,
			base?: string
		) =>
			send(base, path, cookie, {
				method: 'POST',
				headers: { accept: 'text/html' },
				body: fields instanceof FormData ? fields : new URLSearchParams(fields)
			})
	};
}
