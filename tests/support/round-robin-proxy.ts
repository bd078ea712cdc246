// A small round-robin proxy in front of several app processes, as a load balancer would be: each
// request goes to the next backend that is up. A backend that refuses the connection (killed)
// is marked down and the request goes to the next one; nothing reached the dead one, so that is
// safe for any method. A request cut off after it reached a backend answers 502 and is counted
// against that backend. Bodies are buffered (the tests' bodies are small) so a retry can resend.
import { createServer, request, type IncomingMessage, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';

export interface Backend {
	name: string;
	port: number;
	up: boolean;
	/** Answers the backend gave, by status. */
	statuses: Map<number, number>;
	/** Requests that reached it and got no answer (cut off by a kill). */
	cutOff: number;
}

export interface Proxy {
	origin: string;
	port: number;
	backends: Backend[];
	close(): Promise<void>;
}

const HOP = ['connection', 'keep-alive', 'transfer-encoding', 'upgrade', 'proxy-connection'];

function body(req: IncomingMessage): Promise<Buffer> {
	return new Promise((resolve, reject) => {
		const chunks: Buffer[] = [];
		req.on('data', (c: Buffer) => chunks.push(c));
		req.on('end', () => resolve(Buffer.concat(chunks)));
		req.on('error', reject);
	});
}

/** Listens on a free port first, so the backends can be told the public origin. */
export async function startProxy(): Promise<
	Proxy & { add(b: Omit<Backend, 'up' | 'statuses' | 'cutOff'>): Backend }
> {
	const backends: Backend[] = [];
	let next = 0;
	const server: Server = createServer(async (req, res) => {
		const payload = await body(req);
		const headers = { ...req.headers };
		for (const h of HOP) delete headers[h];
		headers['content-length'] = String(payload.length);
		for (let tried = 0; tried < backends.length; tried++) {
			const b = backends[next++ % backends.length]!;
			if (!b.up) continue;
			const outcome = await new Promise<'done' | 'refused'>((resolve) => {
				const out = request(
					{
						host: '127.0.0.1',
						port: b.port,
						method: req.method,
						path: req.url,
						headers,
						agent: false
					},
					(answer) => {
						const code = answer.statusCode ?? 0;
						b.statuses.set(code, (b.statuses.get(code) ?? 0) + 1);
						const h = { ...answer.headers };
						for (const x of HOP) delete h[x];
						res.writeHead(code, h);
						answer.pipe(res);
						answer.on('close', () => {
							// The backend died while sending the body: the client sees a cut-off answer.
							if (!answer.complete) {
								b.cutOff++;
								res.destroy();
							}
							resolve('done');
						});
					}
				);
				out.on('error', (e: NodeJS.ErrnoException) => {
					if (e.code === 'ECONNREFUSED') {
						b.up = false;
						resolve('refused');
						return;
					}
					if (!res.headersSent) {
						b.cutOff++;
						res
							.writeHead(502, { 'content-type': 'text/plain' })
							.end(`backend ${b.name}: ${e.code}`);
					} else res.destroy();
					resolve('done');
				});
				out.end(payload);
			});
			if (outcome === 'done') return;
		}
		res.writeHead(503, { 'content-type': 'text/plain' }).end('no backend is up');
	});
	await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
	const { port } = server.address() as AddressInfo;
	return {
		origin: `http://localhost:${port}`,
		port,
		backends,
		add(b) {
			const backend: Backend = { ...b, up: true, statuses: new Map(), cutOff: 0 };
			backends.push(backend);
			return backend;
		},
		close: () => new Promise((r) => server.close(() => r()))
	};
}

/** 5xx answers a backend itself gave (not the proxy's 502 for a cut-off request). */
export const serverErrors = (b: Backend) =>
	[...b.statuses].filter(([s]) => s >= 500).reduce((n, [, c]) => n + c, 0);

/** Every answer a backend gave. */
export const answered = (b: Backend) => [...b.statuses.values()].reduce((n, c) => n + c, 0);
