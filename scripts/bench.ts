// npm run bench [-- --db sqlite|postgres --no-build --seconds 10 --connections 10 --no-lighthouse --no-js --keep]
//                [--only health,checks-token,checks-session,procedures,records-filter,booth-out,booth-welder]
// Builds and starts the production server on a throw-away seeded database, grows one shop from
// 1k to 100k settings records (timing its list at each size), then loads each route with
// autocannon beside a bare SvelteKit probe app (scripts/bench/probe/, same Kit, adapter and Node)
// started in the same run, sends 10,000 mixed requests and reads the server's memory, measures
// each page's JavaScript in Chromium, times the procedure sheet, audits two pages with
// Lighthouse, loads the filtered list with 1 and 3 processes behind a round-robin proxy, and
// prints the goals of issue 13 as met / short. `--only <route ids>` is the quick A/B run: the
// probe and the named routes' throughput only (no growth timings, mixed requests, JS, sheets,
// Lighthouse or multi-process phases); the shop is still grown to 100k when the filtered list is named. Figures also go to bench-results/. With
// `--db postgres` the seed is copied into a throw-away PostgreSQL cluster and everything runs there.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { stackEnv, startCatcher } from './lib/local-stack';
import { openSqlite } from './lib/sqlite-file';
import { signInCookie, timeSequential, waitFor } from './bench/http';
import { benchPages, measureClientJs } from './bench/client-js';
import { goalRows, printGoals } from './bench/goals';
import { load, type LoadResult, type Route } from './bench/load';
import { cpuMs, memoryMb, mixedRequests } from './bench/mixed';
import { freePort } from './bench/ports';
import { startProbe } from './bench/probe';
import { benchPerson, prepareBench } from './bench/prepare';
import { printFigures, writeFigures, type BenchFigures, type GrowthRow } from './bench/report';
import { addProcedures, addRecords, addShops } from './bench/seed-bulk';
import { benchDatabase, type BenchDatabaseKind } from './bench/database';
import { multiProcess } from './bench/multi';
import { serverArgs } from './lib/server-process';

const arg = (name: string, fallback: number) => {
	const i = process.argv.indexOf(name);
	return i >= 0 ? Number(process.argv[i + 1]) : fallback;
};
const flag = (name: string) => process.argv.includes(name);
/** `--only a,b`: the throughput of these route ids beside the probe, and nothing else. */
const ONLY = flag('--only') ? process.argv[process.argv.indexOf('--only') + 1]!.split(',') : null;
const SECONDS = arg('--seconds', 10);
const CONNECTIONS = arg('--connections', 10);
const DB = (
	flag('--db') ? process.argv[process.argv.indexOf('--db') + 1] : 'sqlite'
) as BenchDatabaseKind;
if (DB !== 'sqlite' && DB !== 'postgres') {
	console.error('--db takes sqlite (the default) or postgres');
	process.exit(2);
}
/** The sizes the list is timed at; the last one stays for the load runs. */
const GROWTH = [1_000, 10_000, 100_000];
const OTHER_SHOPS = ['Bench Shop A', 'Bench Shop B', 'Bench Shop C', 'Bench Shop D'];
const notes: string[] = [];
/** The machine is shared: the 1-minute load average at the end says how busy it was. */
const loadAverage = () => loadavg().map((x) => Math.round(x * 100) / 100);

const buildDir = process.env.BUILD_DIR ?? 'build';
if (!flag('--no-build') || !existsSync(`${buildDir}/index.js`)) {
	console.log(`Building the app into ${buildDir}/ …`);
	const built = spawnSync('npx', ['vite', 'build', '--logLevel', 'warn'], { stdio: 'inherit' });
	if (built.status !== 0) process.exit(built.status ?? 1);
}

const dataDir = mkdtempSync(join(tmpdir(), 'beadline-bench-'));
const port = await freePort();
stackEnv({ dataDir, port, smtpPort: await freePort() });
Object.assign(process.env, {
	BEADLINE_JOBS: 'off',
	SIGNIN_LIMIT_IP_PER_MINUTE: '100000',
	FORM_LIMIT_IP_PER_MINUTE: '100000',
	// One address sends every request here: the booth's per-address cap would measure itself.
	BOOTH_LIMIT_IP_PER_MINUTE: '100000000',
	// adapter-node waits this long for keep-alive connections at SIGTERM (default 30 s).
	SHUTDOWN_TIMEOUT: '2'
});
const origin = `http://localhost:${port}`;

// ---- data: the app's own rows first, then bulk clones of them ----
const seedStart = Date.now();
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
for (const shop of await addShops(db, OTHER_SHOPS)) {
	await addRecords(db, shop, 2_500, templates);
	await addProcedures(db, shop, 1_000, procTemplate, 'WPS-B');
}
// The procedure list's goal is set at 10k procedures in the shop.
await addProcedures(db, larkspur, 10_000, procTemplate, 'WPS');
await addRecords(db, larkspur, Math.max(0, GROWTH[0]! - templates.length), templates);
const store = await benchDatabase(DB, db, larkspur, templates);
const topUp = async (target: number) => {
	const have = await store.countRecords(fx.shopId);
	if (have < target) await store.addRecords(target - have);
};
const seedSeconds = (Date.now() - seedStart) / 1000;

// ---- the server ----
await startCatcher();
const server = spawn(process.execPath, serverArgs(`${buildDir}/index.js`), {
	env: store.env,
	stdio: ['ignore', 'ignore', 'inherit']
});
await waitFor(`${origin}/api/v1/health`);
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
const filter = '/records?process=GTAW&family=carbon-steel&tmin=1%2F16&tmax=1%2F4';

// ---- list latency as the shop grows ----
const growth: GrowthRow[] = [];
const growStart = Date.now();
for (const size of ONLY ? (ONLY.includes('records-filter') ? GROWTH.slice(-1) : []) : GROWTH) {
	const t = Date.now();
	await topUp(size);
	if (ONLY) continue;
	if (size > GROWTH[0]!)
		console.log(`  grew the shop to ${size} records in ${(Date.now() - t) / 1000} s`);
	await store.settle();
	growth.push({
		records: await store.countRecords(fx.shopId),
		list: await timeSequential(origin + '/records', asEngineer, 100),
		filtered: await timeSequential(origin + filter, asEngineer, 100)
	});
}
const seededTotal = seedSeconds + (Date.now() - growStart) / 1000;

// ---- the booth link of the approved revision: from its table, else off the revision page ----
const linkRow = await db
	.get<{ token: string }>(
		'SELECT token FROM booth_links WHERE procedure_id = ? AND revoked_at IS NULL ORDER BY id DESC',
		[fx.approved.procedureId]
	)
	.catch(() => undefined);
const revisionPage = await fetch(
	`${origin}/procedures/${fx.approved.procedureId}/revisions/${fx.approved.rev}`,
	{ headers: asEngineer }
).then((r) => r.text());
const booth = linkRow
	? `/b/${linkRow.token}`
	: /href="(\/b\/[A-Za-z0-9_-]{16,})"/.exec(revisionPage)?.[1];
if (!booth) notes.push('No booth link (/b/…) for the approved revision: booth view not measured.');

// ---- load: every route in the same run, bare endpoint first ----
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
const json = { 'content-type': 'application/json' };
const allRoutes: Route[] = [
	{ id: 'health', name: '/api/v1/health', path: '/api/v1/health' },
	{
		id: 'checks-token',
		name: '/api/v1/checks (API token)',
		path: '/api/v1/checks',
		method: 'POST',
		headers: { authorization: `Bearer ${fx.token}`, ...json },
		body: checksBody
	},
	{
		id: 'checks-session',
		name: '/api/v1/checks (session)',
		path: '/api/v1/checks',
		method: 'POST',
		headers: { cookie: engineer, origin, ...json },
		body: checksBody
	},
	{ id: 'procedures', name: '/procedures (engineer)', path: '/procedures', headers: asEngineer },
	{ id: 'records-filter', name: '/records?filter (engineer)', path: filter, headers: asEngineer },
	...(booth
		? [
				{ id: 'booth-out', name: '/b/… (signed out: status)', path: booth },
				{
					id: 'booth-welder',
					name: '/b/… (welder: values)',
					path: booth,
					headers: { cookie: welder }
				}
			]
		: [])
];
const routes = ONLY ? allRoutes.filter((r) => ONLY.includes(r.id!)) : allRoutes;
const loadOpts = { seconds: SECONDS, connections: CONNECTIONS };
const loadAtStart = loadAverage();
process.stdout.write('  loading the bare probe … ');
const probeApp = await startProbe();
/** Server CPU ms per answered request over one load run (`--only` prints it). */
const cpuPerRequest: [name: string, ms: number][] = [];
const measured = async (pid: number, run: () => Promise<LoadResult>) => {
	const before = cpuMs(pid);
	const res = await run();
	cpuPerRequest.push([res.name, (cpuMs(pid) - before) / Math.max(1, res.requests)]);
	return res;
};
const firstProbe = await measured(probeApp.server.pid!, () =>
	load(probeApp.origin, { name: 'bare SvelteKit probe', path: '/' }, loadOpts)
);
if (!ONLY) await probeApp.stop();
console.log(`${firstProbe.reqPerSec} req/s`);
const results: LoadResult[] = [];
for (const r of routes) {
	process.stdout.write(`  loading ${r.name} … `);
	results.push(await measured(server.pid!, () => load(origin, r, loadOpts)));
	console.log(`${results.at(-1)!.reqPerSec} req/s`);
}
// A quick run on a shared machine: the probe again after the routes, and shares of the mean of
// both probe runs, so a load that changed during the run moves the ceiling as well.
let probe = firstProbe;
if (ONLY) {
	process.stdout.write('  loading the bare probe again … ');
	const again = await measured(probeApp.server.pid!, () =>
		load(probeApp.origin, { name: 'bare SvelteKit probe', path: '/' }, loadOpts)
	);
	await probeApp.stop();
	console.log(`${again.reqPerSec} req/s`);
	probe = { ...firstProbe, reqPerSec: Math.round((firstProbe.reqPerSec + again.reqPerSec) / 2) };
	notes.push(`Load average when the probe started: ${loadAtStart.join(' / ')}.`);
	notes.push(
		`Probe ${firstProbe.reqPerSec} req/s before the routes, ${again.reqPerSec} after; shares of the mean.`
	);
}
for (const res of results) res.ratioToBare = res.reqPerSec / probe.reqPerSec;

// ---- 10,000 mixed requests, then the server's memory ----
const mixed = ONLY ? undefined : await mixedRequests(origin, routes, 10_000, CONNECTIONS);
const rssAfterMixed = mixed ? memoryMb(server.pid!) : undefined;
if (rssAfterMixed)
	console.log(
		`  10,000 mixed requests: RSS ${rssAfterMixed.afterMb} MB (peak ${rssAfterMixed.peakMb})`
	);

// ---- each page's JavaScript, in Chromium, as the role that uses it ----
const js =
	ONLY || flag('--no-js')
		? undefined
		: await measureClientJs(origin, benchPages({ welder, engineer, booth }));

// ---- the procedure sheet: the booth engineer's timing part (it prints its own table) ----
let sheets: BenchFigures['sheets'];
if (ONLY) notes.push(`--only ${ONLY.join(',')}: throughput of these routes beside the probe only.`);
else if (existsSync('scripts/bench/sheets.ts')) {
	const { benchSheets } = await import('./bench/sheets');
	sheets = await benchSheets({ origin, cookie: engineer, ...fx.approved });
} else notes.push('scripts/bench/sheets.ts is not there yet: sheet PDF timing left out.');

// ---- Lighthouse on the login page and the booth view ----
let lighthouse: BenchFigures['lighthouse'];
if (!ONLY && !flag('--no-lighthouse')) {
	const { audit } = await import('./bench/lighthouse');
	lighthouse = await audit(
		origin,
		[
			{ name: 'sign-in page', path: '/signin' },
			// Signed out: what a scan shows first (Lighthouse's extra Cookie header did not reach
			// the page in our runs, so a signed-in audit would only repeat this one).
			...(booth ? [{ name: 'booth view (signed out)', path: booth }] : [])
		],
		await freePort()
	);
}

const rss = memoryMb(server.pid!);
const data = {
	shops: Number((await db.get<{ n: number }>('SELECT count(*) AS n FROM shops'))!.n),
	'settings records': await store.countRecords(),
	'in the measured shop': await store.countRecords(fx.shopId),
	procedures: Number((await db.get<{ n: number }>('SELECT count(*) AS n FROM procedures'))!.n),
	'seconds to seed': Math.round(seededTotal * 10) / 10
};
await db.close();
const serverGone = new Promise((r) => server.once('exit', r));
server.kill('SIGTERM');
await serverGone;
// The filtered list again, now with 1 and with 3 processes on the same database.
const filterRoute = allRoutes.find((r) => r.id === 'records-filter')!;
const multi = ONLY ? undefined : await multiProcess(store.env, filterRoute, loadOpts);
await store.close();
if (!flag('--keep')) rmSync(dataDir, { recursive: true, force: true });
else notes.push(`Data kept in ${dataDir}`);

const figures: BenchFigures = {
	at: new Date().toISOString(),
	load: loadAverage(),
	machine: { node: process.version, cores: cpus().length, platform: process.platform },
	settings: { seconds: SECONDS, connections: CONNECTIONS },
	database: DB,
	data,
	probe,
	routes: results,
	growth,
	mixed: mixed && rssAfterMixed && { ...mixed, rss: rssAfterMixed },
	js,
	goals: goalRows({ probe, routes: results, growth, rssAfterMixedMb: rssAfterMixed?.afterMb, js }),
	sheets,
	lighthouse,
	rss,
	multi,
	notes
};
printFigures(figures);
printGoals(figures.goals);
if (ONLY) {
	// The same shares by CPU: what each route would get of the probe's rate if CPU were all.
	const probeCpu =
		cpuPerRequest.filter(([n]) => n === 'bare SvelteKit probe').reduce((a, [, ms]) => a + ms, 0) /
		2;
	console.log('\nServer CPU per request (user + system, ms) and the probe’s CPU as a share of it');
	for (const [name, ms] of cpuPerRequest)
		console.log(
			`${name.padEnd(40)} ${ms.toFixed(3).padStart(8)} ms   ${((probeCpu / ms) * 100).toFixed(1).padStart(6)} %`
		);
}
console.log(`\nFigures written to ${writeFigures(figures)}`);
process.exit(0);
