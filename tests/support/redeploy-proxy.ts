// A pass-through proxy in front of one app server that can "deploy" a new version of the service
// worker without a second build: after `redeploy()` it answers /service-worker.js with the built
// worker whose version string is replaced, so the phone sees what a new deployment looks like to
// it (a changed worker script at the same address, with a new shell cache name). Everything else
// goes to the server untouched. Test code only: the app has no switch for this.
import { readFileSync } from 'node:fs';
import { createServer, request } from 'node:http';
import { join } from 'node:path';

export interface RedeployProxy {
	/** The version the built worker carries (Kit's `version`, from `_app/version.json`). */
	readonly built: string;
	/** The version /service-worker.js carries now. */
	readonly version: string;
	/** From now on the worker script carries a new version; returns it. */
	redeploy(): string;
	close(): Promise<void>;
}

const HOP = ['connection', 'keep-alive', 'transfer-encoding', 'upgrade', 'proxy-connection'];

export async function redeployProxy(opts: {
	/** Where the phone connects: the port of the server's ORIGIN. */
	port: number;
	/** Where the server listens. */
	backend: number;
	buildDir?: string;
}): Promise<RedeployProxy> {
	const client = join(opts.buildDir ?? process.env.BUILD_DIR ?? 'build', 'client');
	const built = (
		JSON.parse(readFileSync(join(client, '_app/version.json'), 'utf8')) as {
			version: string;
		}
	).version;
	const script = readFileSync(join(client, 'service-worker.js'), 'utf8');
	if (!script.includes(built)) throw new Error(`The built worker does not carry version ${built}`);
	let version = built;
	let served: string | null = null;

	const server = createServer((req, res) => {
		if (served && req.method === 'GET' && req.url?.split('?')[0] === '/service-worker.js') {
			res.writeHead(200, {
				'content-type': 'text/javascript; charset=utf-8',
				'cache-control': 'no-cache'
			});
			res.end(served);
			return;
		}
		const headers = { ...req.headers };
		for (const h of HOP) delete headers[h];
		const out = request(
			{ host: '127.0.0.1', port: opts.backend, method: req.method, path: req.url, headers },
			(answer) => {
				const h = { ...answer.headers };
				for (const x of HOP) delete h[x];
				res.writeHead(answer.statusCode ?? 502, h);
				answer.pipe(res);
			}
		);
		// Not up yet (the health poll at start), or gone: the phone sees a bad gateway.
		out.on('error', () => (res.headersSent ? res.destroy() : res.writeHead(502).end()));
		req.pipe(out);
	});
	await new Promise<void>((r) => server.listen(opts.port, '127.0.0.1', r));
	let deploys = 0;
	return {
		built,
		get version() {
			return version;
		},
		redeploy() {
			version = `${built}-redeploy-${++deploys}`;
			served = script.replaceAll(built, version);
			return version;
		},
		close() {
			server.closeAllConnections();
			return new Promise((r) => server.close(() => r()));
		}
	};
}
