// The filtered records list with 1 process and with 3 processes of build/index.js on the same
// database, each time behind the same round-robin proxy (tests/support/round-robin-proxy.ts), so
// the two figures differ only in the number of processes. The proxy is one Node process itself,
// and on a machine with few cores it and the load generator share them with the app processes:
// the core count is printed beside the figures for that reason.
import { spawn, type ChildProcess } from 'node:child_process';
import { cpus } from 'node:os';
import { startProxy } from '../../tests/support/round-robin-proxy';
import { waitFor } from './http';
import { load, type LoadResult, type Route } from './load';
import { freePort } from './ports';
import { serverArgs } from '../lib/server-process';

export interface MultiRow {
	processes: number;
	cores: number;
	result: LoadResult;
}

async function behindProxy(
	n: number,
	env: NodeJS.ProcessEnv,
	route: Route,
	opts: { seconds: number; connections: number }
): Promise<MultiRow> {
	const proxy = await startProxy();
	const children: ChildProcess[] = [];
	try {
		for (let i = 1; i <= n; i++) {
			const port = await freePort();
			const child = spawn(
				process.execPath,
				serverArgs(`${process.env.BUILD_DIR ?? 'build'}/index.js`),
				{
					env: { ...env, PORT: String(port) },
					stdio: ['ignore', 'ignore', 'inherit']
				}
			);
			children.push(child);
			proxy.add({ name: `app${i}`, port });
			await waitFor(`http://localhost:${port}/api/v1/health`);
		}
		return { processes: n, cores: cpus().length, result: await load(proxy.origin, route, opts) };
	} finally {
		await Promise.all(
			children.map(
				(c) =>
					new Promise((r) => {
						if (c.exitCode !== null) return r(null);
						c.once('exit', r);
						c.kill('SIGTERM');
					})
			)
		);
		await proxy.close();
	}
}

/** Run with the main bench server stopped, so the processes measured are the only app running. */
export async function multiProcess(
	env: NodeJS.ProcessEnv,
	route: Route,
	opts: { seconds: number; connections: number }
): Promise<MultiRow[]> {
	const rows: MultiRow[] = [];
	for (const n of [1, 3]) {
		process.stdout.write(`  loading ${route.name} with ${n} process(es) behind the proxy … `);
		const row = await behindProxy(n, env, route, opts);
		console.log(`${row.result.reqPerSec} req/s (${row.cores} cores)`);
		rows.push(row);
	}
	return rows;
}
