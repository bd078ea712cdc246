// npm run bench:memory [-- --no-build --warm-seconds 0 --snapshot --keep]
// The memory part of `npm run bench` alone, without its throughput runs (which keep a shared
// machine busy for minutes): the same build, the same seeded data (100k records and 10k
// procedures in the measured shop), the same server start, the same 10,000 mixed requests, then
// the server's resident memory (after and peak) and, from a Node diagnostic report taken on
// SIGUSR2 (`--report-on-signal`, no app code involved), the V8 heap used / total, external and
// malloced memory and whether the native addons (sharp, libvips) were loaded. `--snapshot` also
// writes a heap snapshot after the mixed requests and prints what holds the heap
// (scripts/bench/heap-summary.ts). `--warm-seconds N` first loads each route for N seconds, as
// the full bench's throughput runs do before its mixed requests (they ran 10 s each).
// Memory readings do not depend on timing, so a busy machine gives the same figures.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { stackEnv, startCatcher } from '../lib/local-stack';
import { openSqlite } from '../lib/sqlite-file';
import { signInCookie, waitFor } from './http';
import { load, type Route } from './load';
import { memoryMb, mixedRequests } from './mixed';
import { freePort } from './ports';
import { benchPerson, prepareBench, type BenchFixture } from './prepare';
import { addProcedures, addRecords, addShops } from './seed-bulk';
import { summariseSnapshot } from './heap-summary';
import { serverArgs } from '../lib/server-process';

const flag = (name: string) => process.argv.includes(name);
const arg = (name: string, fallback: number) => {
	const i = process.argv.indexOf(name);
	return i >= 0 ? Number(process.argv[i + 1]) : fallback;
};
const WARM = arg('--warm-seconds', 0);
const CONNECTIONS = 10;

const buildDir = process.env.BUILD_DIR ?? 'build';
if (!flag('--no-build') || !existsSync(`${buildDir}/index.js`)) {
	console.log(`Building the app into ${buildDir}/ …`);
	const built = spawnSync('npx', ['vite', 'build', '--logLevel', 'warn'], { stdio: 'inherit' });
	if (built.status !== 0) process.exit(built.status ?? 1);
}

// `--reuse DIR`: the data folder a run with --keep left (seeding takes minutes; measuring does not).
const reuse = process.argv.includes('--reuse')
	? process.argv[process.argv.indexOf('--reuse') + 1]
	: undefined;
const dataDir = reuse ?? mkdtempSync(join(tmpdir(), 'beadline-bench-mem-'));
const diagDir = mkdtempSync(join(dataDir, 'diagnostics-'));
const port = await freePort();
stackEnv({ dataDir, port, smtpPort: await freePort() });
Object.assign(process.env, {
	BEADLINE_JOBS: 'off',
	SIGNIN_LIMIT_IP_PER_MINUTE: '100000',
	FORM_LIMIT_IP_PER_MINUTE: '100000',
	BOOTH_LIMIT_IP_PER_MINUTE: '100000000',
	SHUTDOWN_TIMEOUT: '2'
});
const origin = `http://localhost:${port}`;

// ---- the same data as the bench: 4 other shops, 10k procedures and 100k records in the measured one
const fixtureFile = join(dataDir, 'fixture.json');
const seeded = reuse
	? (JSON.parse(readFileSync(fixtureFile, 'utf8')) as { fx: BenchFixture; booth?: string })
	: await seed();
const { fx } = seeded;
writeFileSync(fixtureFile, JSON.stringify(seeded));

async function seed(): Promise<{ fx: BenchFixture; booth?: string }> {
	console.log('Seeding …');
	const fx = await prepareBench();
	const db = await openSqlite(process.env.DATABASE_FILE!, { mustExist: true });
	const templates = await db.all('SELECT * FROM settings_records WHERE shop_id = ?', [fx.shopId]);
	const procTemplate = {
		procedure: (await db.get('SELECT * FROM procedures WHERE id = ?', [fx.template.procedureId]))!,
		revision: (await db.get('SELECT * FROM procedure_revisions WHERE procedure_id = ?', [
			fx.template.procedureId
		]))!
	};
	const authors = await db.all<{ id: string }>(
		"SELECT id FROM users WHERE shop_id = ? AND role IN ('engineer', 'admin')",
		[fx.shopId]
	);
	const larkspur = { shopId: fx.shopId, authorIds: authors.map((a) => a.id) };
	for (const shop of await addShops(db, [
		'Bench Shop A',
		'Bench Shop B',
		'Bench Shop C',
		'Bench Shop D'
	])) {
		await addRecords(db, shop, 2_500, templates);
		await addProcedures(db, shop, 1_000, procTemplate, 'WPS-B');
	}
	await addProcedures(db, larkspur, 10_000, procTemplate, 'WPS');
	await addRecords(db, larkspur, 100_000 - templates.length, templates);
	await db.exec('PRAGMA wal_checkpoint(TRUNCATE)');
	const linkRow = await db.get<{ token: string }>(
		'SELECT token FROM booth_links WHERE procedure_id = ? AND revoked_at IS NULL ORDER BY id DESC',
		[fx.approved.procedureId]
	);
	await db.close();
	return { fx, booth: linkRow ? `/b/${linkRow.token}` : undefined };
}

// ---- the server, started as `npm start` starts it, plus the diagnostic signals
await startCatcher();
const server: ChildProcess = spawn(
	process.execPath,
	[
		'--report-on-signal',
		'--report-signal=SIGUSR2',
		`--report-directory=${diagDir}`,
		'--heapsnapshot-signal=SIGWINCH',
		// Experiments: `BENCH_NODE_ARGS='--max-semi-space-size=1' npm run bench:memory`.
		...(process.env.BENCH_NODE_ARGS ?? '').split(' ').filter(Boolean),
		...serverArgs(resolve(buildDir, 'index.js'))
	],
	{ env: process.env, stdio: ['ignore', 'ignore', 'inherit'], cwd: diagDir }
);
await waitFor(`${origin}/api/v1/health`);
const atStart = memoryMb(server.pid!);
const engineer = await signInCookie(
	origin,
	benchPerson('engineer').email,
	benchPerson('engineer').password
);
const welder = await signInCookie(
	origin,
	benchPerson('welder').email,
	benchPerson('welder').password
);
const asEngineer = { cookie: engineer };
const json = { 'content-type': 'application/json' };
const checksBody = JSON.stringify({
	process: 'GTAW',
	currentType: 'DCEN',
	amps: 125,
	volts: 12,
	travelSpeed: { value: 4, unit: 'in/min' },
	thickness: { value: 0.125, unit: 'in' },
	baseMetal: { spec: 'A36' },
	filler: { classification: 'ER70S-6', diameter: { value: 0.09375, unit: 'in' } },
	tungsten: { classification: 'EWLa-1.5', diameter: { value: 2.4, unit: 'mm' } },
	gas: { name: 'argon', flow: { value: 20, unit: 'CFH' } }
});
const booth = seeded.booth;
// The same routes, in the same order, as scripts/bench.ts.
const routes: Route[] = [
	{ name: '/api/v1/health', path: '/api/v1/health' },
	{
		name: '/api/v1/checks (API token)',
		path: '/api/v1/checks',
		method: 'POST',
		headers: { authorization: `Bearer ${fx.token}`, ...json },
		body: checksBody
	},
	{
		name: '/api/v1/checks (session)',
		path: '/api/v1/checks',
		method: 'POST',
		headers: { cookie: engineer, origin, ...json },
		body: checksBody
	},
	{ name: '/procedures (engineer)', path: '/procedures', headers: asEngineer },
	{
		name: '/records?filter (engineer)',
		path: '/records?process=GTAW&family=carbon-steel&tmin=1%2F16&tmax=1%2F4',
		headers: asEngineer
	},
	...(booth
		? [
				{ name: '/b/… (signed out)', path: booth },
				{ name: '/b/… (welder)', path: booth, headers: { cookie: welder } }
			]
		: [])
];
if (WARM > 0)
	for (const r of routes) {
		process.stdout.write(`  warming ${r.name} for ${WARM} s … `);
		console.log(`${(await load(origin, r, { seconds: WARM, connections: CONNECTIONS })).requests}`);
	}

const mixed = await mixedRequests(origin, routes, 10_000, CONNECTIONS);
const after = memoryMb(server.pid!);

/** Asks the server for a diagnostic report (SIGUSR2) and waits for the file. */
/** The parts of Node's diagnostic report read here (`process.report` JSON). */
interface NodeReport {
	javascriptHeap: {
		usedMemory: number;
		totalMemory: number;
		totalCommittedMemory: number;
		externalMemory?: number;
		mallocedMemory: number;
		peakMallocedMemory: number;
		heapSpaces: Record<string, { used: number; memorySize: number }>;
	};
	sharedObjects: string[];
}
async function report(): Promise<NodeReport> {
	const before = new Set(readdirSync(diagDir));
	server.kill('SIGUSR2');
	for (let i = 0; i < 100; i++) {
		const file = readdirSync(diagDir).find((f) => f.startsWith('report.') && !before.has(f));
		if (file) {
			try {
				return JSON.parse(readFileSync(join(diagDir, file), 'utf8'));
			} catch {
				// still being written
			}
		}
		await new Promise((r) => setTimeout(r, 200));
	}
	throw new Error('The server wrote no diagnostic report');
}
const rep = await report();
const heap = rep.javascriptHeap;
const mb = (bytes: number) => Math.round((bytes / 1024 / 1024) * 10) / 10;
const natives = rep.sharedObjects
	.filter((s) => /\.node$|libvips|sharp/.test(s))
	.map((s) => s.replace(/^.*node_modules\//, ''));
console.log(`
  10,000 mixed requests: ${mixed.requests} answered, ${mixed.non2xx} not 2xx, ${mixed.errors} errors
  RSS at start ${atStart.afterMb} MB; after the mixed requests ${after.afterMb} MB (peak ${after.peakMb} MB)
  V8 heap used ${mb(heap.usedMemory)} MB of ${mb(heap.totalMemory)} MB (committed ${mb(heap.totalCommittedMemory)} MB)
  external ${mb(heap.externalMemory ?? NaN)} MB; malloced by V8 ${mb(heap.mallocedMemory)} MB (peak ${mb(heap.peakMallocedMemory)} MB)
  heap spaces (used / size MB): ${Object.entries(heap.heapSpaces)
		.map(([k, v]) => `${k.replace(/_space$/, '')} ${mb(v.used)}/${mb(v.memorySize)}`)
		.join(', ')}
  native addons loaded: ${natives.join(', ') || 'none'}`);

if (flag('--snapshot')) {
	const before = new Set(readdirSync(diagDir));
	server.kill('SIGWINCH');
	let file: string | undefined;
	let lastSize = -1;
	for (let i = 0; i < 600; i++) {
		await new Promise((r) => setTimeout(r, 500));
		file ??= readdirSync(diagDir).find((f) => f.endsWith('.heapsnapshot') && !before.has(f));
		if (!file) continue;
		const size = readFileSync(join(diagDir, file)).length;
		if (size === lastSize && size > 0) {
			try {
				JSON.parse(readFileSync(join(diagDir, file), 'utf8'));
				break;
			} catch {
				// not complete yet
			}
		}
		lastSize = size;
	}
	if (file) summariseSnapshot(join(diagDir, file));
	const gc = memoryMb(server.pid!);
	const h = (await report()).javascriptHeap;
	console.log(
		`  after the snapshot's full GC: RSS ${gc.afterMb} MB, heap used ${mb(h.usedMemory)} of ${mb(h.totalMemory)} MB`
	);
}

const gone = new Promise((r) => server.once('exit', r));
server.kill('SIGTERM');
await gone;
if (!flag('--keep') && !reuse) rmSync(dataDir, { recursive: true, force: true });
else console.log(`  data and diagnostics kept in ${dataDir}`);
process.exit(0);
