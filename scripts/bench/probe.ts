// The bare probe (scripts/bench/probe/): built and started beside the app in the same bench run,
// on the same Node, so every figure can be given as a share of what Kit alone answers here.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { join, resolve } from 'node:path';
import { waitFor } from './http';
import { freePort } from './ports';

export interface Probe {
	origin: string;
	server: ChildProcess;
	stop(): Promise<void>;
}

export async function startProbe(): Promise<Probe> {
	const dir = resolve('scripts/bench/probe');
	// Under node_modules (ignored by git, lint and types), so its output resolves Kit's packages.
	const cache = resolve('node_modules/.cache/beadline-probe');
	const out = join(cache, 'build');
	const env = { ...process.env, PROBE_OUT: out, PROBE_KIT_DIR: join(cache, 'kit') };
	const vite = resolve('node_modules/vite/bin/vite.js');
	const built = spawnSync(process.execPath, [vite, 'build', '--logLevel', 'warn'], {
		cwd: dir,
		env,
		encoding: 'utf8'
	});
	if (built.status !== 0)
		throw new Error(`The probe did not build:\n${built.stdout}${built.stderr}`);
	const port = await freePort();
	const server = spawn(process.execPath, [join(out, 'index.js')], {
		env: { ...env, PORT: String(port), HOST: '127.0.0.1', ORIGIN: `http://localhost:${port}` },
		stdio: ['ignore', 'ignore', 'inherit']
	});
	const origin = `http://localhost:${port}`;
	await waitFor(origin + '/');
	return {
		origin,
		server,
		async stop() {
			const gone = new Promise((r) => server.once('exit', r));
			server.kill('SIGTERM');
			await gone;
		}
	};
}
