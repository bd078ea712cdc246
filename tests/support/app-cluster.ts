// Several processes of the built app on one database and one upload store, behind the
// round-robin proxy: what a host running Beadline for many shops would run. The database and
// the store come from the environment of the test run:
//   MULTI_DATABASE=sqlite (one WAL file; default) | postgres (DATABASE_URL of a running server)
//   MULTI_STORAGE=local (one uploads folder; default) | s3
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simpleParser } from 'mailparser';
import type { SMTPServer } from 'smtp-server';
import { startMailCatcher } from '../../src/lib/server/mail/catcher';
import { openAnyDatabase, type AnyDatabase } from './any-database';
import { startProxy, type Backend, type Proxy } from './round-robin-proxy';

export function freePort(): Promise<number> {
	return new Promise((resolve) => {
		const s = createServer().listen(0, '127.0.0.1', () => {
			const { port } = s.address() as { port: number };
			s.close(() => resolve(port));
		});
	});
}

export interface AppProcess {
	name: string;
	/** The process's own address, past the proxy (for "through this one, then that one"). */
	direct: string;
	backend: Backend;
	child: ChildProcess | null;
}

export interface Cluster {
	/** Which database and store the processes share, as the test's tag line prints it. */
	configuration: string;
	proxy: Proxy;
	apps: AppProcess[];
	env: NodeJS.ProcessEnv;
	db: AnyDatabase;
	/** Caught mail: [recipients, subject] of every message so far. */
	mail(): Promise<{ to: string; subject: string }[]>;
	kill(app: AppProcess): Promise<void>;
	dispose(): Promise<void>;
}

async function healthy(origin: string, timeoutMs: number): Promise<void> {
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

/** Where the shared state lives: the SQLite file and uploads folder, or what the environment names. */
async function sharedStores(dataDir: string): Promise<{
	env: Record<string, string>;
	label: string;
	stop: () => Promise<void>;
}> {
	const database = process.env.MULTI_DATABASE ?? 'sqlite';
	const storage = process.env.MULTI_STORAGE ?? 'local';
	const env: Record<string, string> = {};
	const labels: string[] = [];
	if (database === 'postgres') {
		if (!process.env.DATABASE_URL?.startsWith('postgres'))
			throw new Error(
				'MULTI_DATABASE=postgres needs DATABASE_URL=postgres://… of an empty database'
			);
		env.DATABASE_URL = process.env.DATABASE_URL;
		labels.push(`PostgreSQL (${new URL(env.DATABASE_URL).host})`);
	} else {
		env.DATABASE_FILE = join(dataDir, 'beadline.sqlite');
		labels.push('one SQLite file (WAL, busy timeout)');
	}
	if (storage === 's3') {
		for (const k of Object.keys(process.env).filter((k) => k.startsWith('S3_') || k === 'STORAGE'))
			env[k] = process.env[k]!;
		labels.push(`an S3 bucket (${env.S3_ENDPOINT ?? 'AWS'})`);
	} else {
		env.UPLOADS_DIR = join(dataDir, 'uploads');
		labels.push('one local uploads folder');
	}
	return { env, label: labels.join(' + '), stop: async () => {} };
}

export async function startCluster(n = 3): Promise<Cluster> {
	const dataDir = mkdtempSync(join(tmpdir(), 'beadline-multi-'));
	const proxy = await startProxy();
	const smtpPort = await freePort();
	const stores = await sharedStores(dataDir);
	const mailDir = join(dataDir, 'mail');
	const env: NodeJS.ProcessEnv = {
		...process.env,
		...stores.env,
		DATA_DIR: dataDir,
		// One secret for all: a session signed by one process is good on every other.
		AUTH_SECRET: randomBytes(32).toString('base64url'),
		MAIL_CATCHER_DIR: mailDir,
		SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
		ORIGIN: proxy.origin,
		HOST: '127.0.0.1',
		BODY_SIZE_LIMIT: '80M',
		// The jobs tick every half second in every process, so each process tries them.
		BEADLINE_JOBS: 'on',
		BEADLINE_JOBS_INTERVAL_MS: '500',
		SIGNIN_LIMIT_IP_PER_MINUTE: '100000',
		FORM_LIMIT_IP_PER_MINUTE: '100000',
		BOOTH_LIMIT_IP_PER_MINUTE: '100000'
	};
	const prep = spawnSync(process.execPath, ['--import', 'tsx', 'tests/support/prepare-data.ts'], {
		env,
		encoding: 'utf8'
	});
	if (prep.status !== 0) throw new Error(`Preparing the shared database failed: ${prep.stderr}`);
	const catcher: SMTPServer = await startMailCatcher({ port: smtpPort, dir: mailDir });
	const buildDir = process.env.BUILD_DIR ?? 'build';

	const apps: AppProcess[] = [];
	for (let i = 1; i <= n; i++) {
		const port = await freePort();
		const name = `app${i}`;
		const child = spawn(process.execPath, [`${buildDir}/index.js`], {
			env: { ...env, PORT: String(port) },
			stdio: ['ignore', 'ignore', 'pipe']
		});
		child.stderr?.on('data', (d: Buffer) => process.stderr.write(`[${name}] ${d}`));
		apps.push({
			name,
			direct: `http://localhost:${port}`,
			backend: proxy.add({ name, port }),
			child
		});
	}
	await Promise.all(apps.map((a) => healthy(a.direct, 60_000)));
	const db = openAnyDatabase(env);

	return {
		configuration: `${n} processes of build/index.js on ${stores.label}, behind a round-robin proxy`,
		proxy,
		apps,
		env,
		db,
		async mail() {
			let files: string[] = [];
			try {
				files = readdirSync(mailDir).filter((f) => f.endsWith('.eml'));
			} catch {
				return [];
			}
			const out: { to: string; subject: string }[] = [];
			for (const f of files) {
				const m = await simpleParser(readFileSync(join(mailDir, f)));
				const to = Array.isArray(m.to) ? m.to.map((a) => a.text).join(',') : (m.to?.text ?? '');
				out.push({ to, subject: m.subject ?? '' });
			}
			return out;
		},
		async kill(app) {
			const child = app.child;
			if (!child || child.exitCode !== null || child.signalCode) return;
			const gone = new Promise((r) => child.once('exit', r));
			child.kill('SIGKILL');
			await gone;
			app.child = null;
		},
		async dispose() {
			await Promise.all(
				apps.map(async (a) => {
					const child = a.child;
					if (!child || child.exitCode !== null) return;
					const gone = new Promise((r) => child.once('exit', r));
					child.kill('SIGTERM');
					await gone;
				})
			);
			await db.close();
			await proxy.close();
			await new Promise((r) => catcher.close(() => r(undefined)));
			await stores.stop();
			rmSync(dataDir, { recursive: true, force: true });
		}
	};
}
