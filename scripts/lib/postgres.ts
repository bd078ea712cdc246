// A throw-away PostgreSQL cluster for tests, the bench and trying things out: Debian's server
// (`apt-get install postgresql`; `pg_config --bindir` says where initdb and pg_ctl are), a fresh
// data folder under the system temp folder, a free port on 127.0.0.1, trust authentication for
// the user `beadline`. PostgreSQL refuses to run as root, so as root the folder is handed to the
// `postgres` user and the server runs through `runuser -u postgres --`.
//
//   const pg = await startPostgres();          // pg.url: postgres://beadline@127.0.0.1:PORT/postgres
//   const url = await pg.createDatabase('t1'); // a fresh, empty database
//   await pg.stop();                           // stops the server and removes the folder
import { execFileSync, spawnSync } from 'node:child_process';
import { chownSync, existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';

export const PG_USER = 'beadline';

export interface RunningPostgres {
	/** The cluster's maintenance database, for administration (CREATE DATABASE …). */
	url: string;
	port: number;
	dir: string;
	/** Creates a database (optionally a copy of `template`) and returns its URL. */
	createDatabase(name: string, template?: string): Promise<string>;
	/** The URL of database `name` on this cluster. */
	urlOf(name: string): string;
	stop(): Promise<void>;
}

/** Where Debian's PostgreSQL server programs are, or null when the server is not installed. */
export function postgresBinDir(): string | null {
	const fromConfig = spawnSync('pg_config', ['--bindir'], { encoding: 'utf8' });
	const candidates: string[] = [];
	if (fromConfig.status === 0) candidates.push(fromConfig.stdout.trim());
	if (existsSync('/usr/lib/postgresql'))
		for (const v of readdirSync('/usr/lib/postgresql').sort().reverse())
			candidates.push(join('/usr/lib/postgresql', v, 'bin'));
	return (
		candidates.find((d) => existsSync(join(d, 'initdb')) && existsSync(join(d, 'pg_ctl'))) ?? null
	);
}

export function freePort(): Promise<number> {
	return new Promise((resolve, reject) => {
		const srv = createServer();
		srv.once('error', reject);
		srv.listen(0, '127.0.0.1', () => {
			const { port } = srv.address() as { port: number };
			srv.close(() => resolve(port));
		});
	});
}

const asRoot = () => process.getuid?.() === 0;

function run(bin: string, args: string[]): void {
	const [cmd, argv] = asRoot() ? ['runuser', ['-u', 'postgres', '--', bin, ...args]] : [bin, args];
	const r = spawnSync(cmd, argv, { encoding: 'utf8' });
	if (r.status !== 0)
		throw new Error(
			`${bin.split('/').pop()} failed (exit ${r.status}): ${(r.stderr || r.stdout).trim()}`
		);
}

const quoteIdent = (name: string) => `"${name.replace(/"/g, '""')}"`;

export async function startPostgres(opts: { port?: number } = {}): Promise<RunningPostgres> {
	const bin = postgresBinDir();
	if (!bin)
		throw new Error(
			"PostgreSQL's server is not installed: run `apt-get install -y postgresql` (npm test does this when it runs as root)."
		);
	const dir = mkdtempSync(join(tmpdir(), 'beadline-pg-'));
	if (asRoot()) {
		const uid = Number(execFileSync('id', ['-u', 'postgres'], { encoding: 'utf8' }));
		const gid = Number(execFileSync('id', ['-g', 'postgres'], { encoding: 'utf8' }));
		chownSync(dir, uid, gid);
	}
	const data = join(dir, 'db');
	const port = opts.port ?? (await freePort());
	// C collation: text sorts by code point, as SQLite's default BINARY collation does.
	run(join(bin, 'initdb'), ['-D', data, '-A', 'trust', '-U', PG_USER, '-E', 'UTF8', '--locale=C']);
	// A test cluster: nothing in it must survive a crash, so skip the flushes that make it durable.
	const serverOpts = [
		`-p ${port}`,
		`-k ${dir}`,
		'-c listen_addresses=127.0.0.1',
		'-c fsync=off',
		'-c synchronous_commit=off',
		'-c full_page_writes=off',
		'-c max_connections=200'
	].join(' ');
	run(join(bin, 'pg_ctl'), [
		'-D',
		data,
		'-o',
		serverOpts,
		'-l',
		join(dir, 'server.log'),
		'-w',
		'start'
	]);

	let stopped = false;
	const stopNow = (mode: 'fast' | 'immediate') => {
		if (stopped) return;
		stopped = true;
		try {
			run(join(bin, 'pg_ctl'), ['-D', data, '-m', mode, '-w', 'stop']);
		} finally {
			rmSync(dir, { recursive: true, force: true });
		}
	};
	// A test run that dies must not leave a server behind.
	const onExit = () => stopNow('immediate');
	process.once('exit', onExit);

	const urlOf = (name: string) =>
		`postgres://${PG_USER}@127.0.0.1:${port}/${encodeURIComponent(name)}`;
	const url = urlOf('postgres');
	return {
		url,
		port,
		dir,
		urlOf,
		async createDatabase(name, template) {
			const client = new pg.Client({ connectionString: url });
			await client.connect();
			try {
				await client.query(
					`CREATE DATABASE ${quoteIdent(name)}${template ? ` TEMPLATE ${quoteIdent(template)}` : ''}`
				);
			} finally {
				await client.end();
			}
			return urlOf(name);
		},
		async stop() {
			process.off('exit', onExit);
			stopNow('fast');
		}
	};
}
