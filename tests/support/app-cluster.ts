// Several processes of the built app on one database and one upload store, behind the
// round-robin proxy: what a host running Beadline for many shops would run. The database and
// the store (see sharedStores):
//   MULTI_DATABASE=postgres (default: a throw-away cluster) | sqlite (one WAL file)
//   MULTI_STORAGE=s3 (default: s3rver on a free port) | local (one uploads folder)
import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simpleParser } from 'mailparser';
import type { SMTPServer } from 'smtp-server';
import { startPostgres } from '../../scripts/lib/postgres';
import { startS3Fake } from '../../scripts/lib/s3-fake';
import { startMailCatcher } from '../../src/lib/server/mail/catcher';
import { openAnyDatabase, type AnyDatabase } from './any-database';
import { freePort, healthy, prepareData } from './own-server';
import { startProxy, type Backend, type Proxy } from './round-robin-proxy';

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

/**
 * Where the shared state lives. The target of a hosted install, and the default: a throw-away
 * PostgreSQL (scripts/lib/postgres.ts) and an s3rver bucket (scripts/lib/s3-fake.ts).
 * MULTI_DATABASE=sqlite and MULTI_STORAGE=local run the same test on one SQLite file and one
 * uploads folder instead.
 */
async function sharedStores(dataDir: string): Promise<{
	env: Record<string, string>;
	label: string;
	stop: () => Promise<void>;
}> {
	const database = process.env.MULTI_DATABASE ?? 'postgres';
	const storage = process.env.MULTI_STORAGE ?? 's3';
	const env: Record<string, string> = {};
	const labels: string[] = [];
	const stops: (() => Promise<void>)[] = [];
	if (database === 'postgres') {
		const pg = await startPostgres();
		stops.push(() => pg.stop());
		env.DATABASE_URL = await pg.createDatabase('beadline_multi');
		labels.push(`PostgreSQL (a throw-away cluster, ${new URL(pg.url).host})`);
	} else {
		env.DATABASE_FILE = join(dataDir, 'beadline.sqlite');
		labels.push('one SQLite file (WAL, busy timeout)');
	}
	if (storage === 's3') {
		const s3 = await startS3Fake();
		stops.push(() => s3.close());
		Object.assign(env, s3.env);
		labels.push(`an s3rver bucket (${s3.endpoint})`);
	} else {
		env.UPLOADS_DIR = join(dataDir, 'uploads');
		labels.push('one local uploads folder');
	}
	return {
		env,
		label: labels.join(' + '),
		stop: async () => {
			for (const stop of stops.reverse()) await stop();
		}
	};
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
		// adapter-node waits this long for open keep-alive connections at SIGTERM (default 30 s).
		SHUTDOWN_TIMEOUT: '2',
		// The jobs tick every half second in every process, so each process tries them.
		BEADLINE_JOBS: 'on',
		BEADLINE_JOBS_INTERVAL_MS: '500',
		SIGNIN_LIMIT_IP_PER_MINUTE: '100000',
		FORM_LIMIT_IP_PER_MINUTE: '100000',
		BOOTH_LIMIT_IP_PER_MINUTE: '100000'
	};
	await prepareData(env, 'the shared database');
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
			const step = async (what: string, work: () => Promise<unknown>) => {
				const t = Date.now();
				await work();
				if (process.env.MULTI_DEBUG) console.log(`[multi] dispose: ${what} ${Date.now() - t} ms`);
			};
			await step('processes', () =>
				Promise.all(
					apps.map(async (a) => {
						const child = a.child;
						if (!child || child.exitCode !== null || child.signalCode) return;
						const gone = new Promise((r) => child.once('exit', r));
						child.kill('SIGTERM');
						// A process that does not stop within its shutdown timeout is killed.
						const late = setTimeout(() => child.kill('SIGKILL'), 5_000);
						await gone;
						clearTimeout(late);
					})
				)
			);
			await step('database connection', () => db.close());
			await step('proxy', () => proxy.close());
			await step('mail catcher', () => new Promise((r) => catcher.close(() => r(undefined))));
			await step('stores', () => stores.stop());
			rmSync(dataDir, { recursive: true, force: true });
		}
	};
}
