// A production server of the test's own, on a throw-away data folder, for the tests that must
// kill, restart or restore it (the shared end-to-end server must stay up for everyone else).
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { SMTPServer } from 'smtp-server';
import { startMailCatcher } from '../../src/lib/server/mail/catcher';

export function freePort(): Promise<number> {
	return new Promise((resolve) => {
		const s = createServer().listen(0, '127.0.0.1', () => {
			const { port } = s.address() as { port: number };
			s.close(() => resolve(port));
		});
	});
}

export interface OwnServer {
	origin: string;
	dataDir: string;
	env: NodeJS.ProcessEnv;
	databaseFile: string;
	uploadsDir: string;
	child: ChildProcess | null;
	start(): Promise<number>;
	kill(signal?: NodeJS.Signals): Promise<void>;
	dispose(): Promise<void>;
}

export async function healthy(origin: string, timeoutMs: number): Promise<void> {
	const until = Date.now() + timeoutMs;
	while (Date.now() < until) {
		try {
			if ((await fetch(`${origin}/api/v1/health`)).ok) return;
		} catch {
			// not listening yet
		}
		await new Promise((r) => setTimeout(r, 100));
	}
	throw new Error(`${origin} did not come up in ${timeoutMs} ms`);
}

/**
 * Migrates and seeds the stores `env` names, in a child. Not spawnSync: a bucket the seed writes
 * to (s3rver) may be answering from this very process, which must keep its event loop turning.
 */
export async function prepareData(env: NodeJS.ProcessEnv, label: string): Promise<void> {
	const prep = spawn(process.execPath, ['--import', 'tsx', 'tests/support/prepare-data.ts'], {
		env,
		stdio: ['ignore', 'ignore', 'pipe']
	});
	let prepErr = '';
	prep.stderr.on('data', (d: Buffer) => (prepErr += d.toString()));
	const status = await new Promise<number | null>((r) => prep.once('exit', r));
	if (status !== 0) throw new Error(`Preparing ${label} failed: ${prepErr}`);
}

/**
 * Migrates and seeds a fresh data folder; `start()` then runs the built app on it. `env` adds
 * or overrides variables (e.g. a bucket's STORAGE=s3 and S3_* from scripts/lib/s3-fake.ts).
 */
export async function ownServer(
	opts: { dataDir?: string; env?: Record<string, string> } = {}
): Promise<OwnServer> {
	const dataDir = opts.dataDir ?? mkdtempSync(join(tmpdir(), 'beadline-own-'));
	const [port, smtpPort] = [await freePort(), await freePort()];
	const origin = `http://localhost:${port}`;
	const env: NodeJS.ProcessEnv = {
		...process.env,
		DATA_DIR: dataDir,
		DATABASE_FILE: join(dataDir, 'beadline.sqlite'),
		UPLOADS_DIR: join(dataDir, 'uploads'),
		MAIL_CATCHER_DIR: join(dataDir, 'mail'),
		SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
		ORIGIN: origin,
		PORT: String(port),
		HOST: '127.0.0.1',
		BODY_SIZE_LIMIT: '80M',
		BEADLINE_JOBS: 'off',
		// Test-only: lifts the sign-in, form and booth caps where NODE_ENV is test (address-caps.ts).
		NODE_ENV: 'test',
		TEST_ONLY_LIFT_ADDRESS_CAPS: '1',
		...opts.env
	};
	await prepareData(env, dataDir);
	const catcher: SMTPServer = await startMailCatcher({
		port: smtpPort,
		dir: env.MAIL_CATCHER_DIR!
	});
	const buildDir = process.env.BUILD_DIR ?? 'build';

	const server: OwnServer = {
		origin,
		dataDir,
		env,
		databaseFile: env.DATABASE_FILE!,
		uploadsDir: env.UPLOADS_DIR!,
		child: null,
		/** Starts the server and resolves with the milliseconds it took to answer. */
		async start() {
			const t = Date.now();
			const child = spawn(process.execPath, [`${buildDir}/index.js`], {
				env,
				stdio: ['ignore', 'ignore', 'pipe']
			});
			child.stderr?.on('data', (d: Buffer) => process.stderr.write(`[own server] ${d}`));
			server.child = child;
			await healthy(origin, 30_000);
			return Date.now() - t;
		},
		async kill(signal = 'SIGKILL') {
			const child = server.child;
			if (!child || child.exitCode !== null || child.signalCode) return;
			const gone = new Promise((r) => child.once('exit', r));
			child.kill(signal);
			await gone;
			server.child = null;
		},
		async dispose() {
			await server.kill('SIGTERM');
			await new Promise((r) => catcher.close(() => r(undefined)));
			rmSync(dataDir, { recursive: true, force: true });
		}
	};
	return server;
}
