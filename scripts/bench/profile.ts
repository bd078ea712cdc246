// node --import tsx scripts/bench/profile.ts [--seconds 5 --records 10000 --out DIR --only health,booth-out]
// Where a request's time goes: the built server runs under `node --cpu-prof` on a throw-away
// seeded database, each hot route is loaded in turn, and the server's CPU profile is summed by
// function (self time) and printed as a top list. The .cpuprofile files stay in the out folder
// for Chrome DevTools or speedscope. `--only` names the routes to load (ids below): one route per
// run gives that route's own top list.
import { spawn } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { stackEnv, startCatcher } from '../lib/local-stack';
import { openSqlite } from '../lib/sqlite-file';
import { freePort } from './ports';
import { signInCookie, waitFor } from './http';
import { load, type Route } from './load';
import { benchPerson, prepareBench } from './prepare';
import { addProcedures, addRecords } from './seed-bulk';
import { busyMs, nowUs, topCosts, type Window } from './cpu-profile';

const arg = (name: string, fallback: string) => {
	const i = process.argv.indexOf(name);
	return i >= 0 ? process.argv[i + 1]! : fallback;
};
const SECONDS = Number(arg('--seconds', '5'));
const RECORDS = Number(arg('--records', '10000'));
const outDir = resolve(arg('--out', 'bench-results/profile'));
const buildDir = process.env.BUILD_DIR ?? 'build';
const only = process.argv.includes('--only') ? arg('--only', '').split(',') : null;

const dataDir = mkdtempSync(join(tmpdir(), 'beadline-profile-'));
const port = await freePort();
stackEnv({ dataDir, port, smtpPort: await freePort() });
Object.assign(process.env, {
	BEADLINE_JOBS: 'off',
	SIGNIN_LIMIT_IP_PER_MINUTE: '100000',
	FORM_LIMIT_IP_PER_MINUTE: '100000',
	BOOTH_LIMIT_IP_PER_MINUTE: '100000000'
});
const origin = `http://localhost:${port}`;
const fx = await prepareBench();
const db = await openSqlite(process.env.DATABASE_FILE!, { mustExist: true });
const templates = await db.all('SELECT * FROM settings_records WHERE shop_id = ?', [fx.shopId]);
const authors = await db.all<{ id: string }>(
	"SELECT id FROM users WHERE shop_id = ? AND role IN ('engineer', 'admin')",
	[fx.shopId]
);
const shop = { shopId: fx.shopId, authorIds: authors.map((a) => a.id) };
await addRecords(db, shop, RECORDS, templates);
await addProcedures(
	db,
	shop,
	RECORDS,
	{
		procedure: (await db.get('SELECT * FROM procedures WHERE id = ?', [fx.template.procedureId]))!,
		revision: (await db.get('SELECT * FROM procedure_revisions WHERE procedure_id = ?', [
			fx.template.procedureId
		]))!
	},
	'WPS'
);
const booth = await db.get<{ token: string }>(
	'SELECT token FROM booth_links WHERE procedure_id = ? AND revoked_at IS NULL',
	[fx.approved.procedureId]
);
await db.close();

await startCatcher();
rmSync(outDir, { recursive: true, force: true });
mkdirSync(outDir, { recursive: true });
const server = spawn(
	process.execPath,
	['--cpu-prof', '--cpu-prof-dir', outDir, `${buildDir}/index.js`],
	{ env: process.env, stdio: ['ignore', 'ignore', 'inherit'] }
);
await waitFor(`${origin}/api/v1/health`);
const cookie = await signInCookie(
	origin,
	benchPerson('engineer').email,
	benchPerson('engineer').password
);
const welder = await signInCookie(
	origin,
	benchPerson('welder').email,
	benchPerson('welder').password
);
const json = { 'content-type': 'application/json' };
const body = JSON.stringify({ process: 'GTAW', amps: 125, thickness: { value: 3, unit: 'mm' } });
const allRoutes: Route[] = [
	{ id: 'health', name: 'health', path: '/api/v1/health' },
	{
		id: 'checks-session',
		name: 'checks (session)',
		path: '/api/v1/checks',
		method: 'POST' as const,
		headers: { ...json, cookie, origin },
		body
	},
	{
		id: 'checks-token',
		name: 'checks (token)',
		path: '/api/v1/checks',
		method: 'POST' as const,
		headers: { ...json, authorization: `Bearer ${fx.token}` },
		body
	},
	{ id: 'procedures', name: 'procedures', path: '/procedures', headers: { cookie } },
	{
		id: 'records-filter',
		name: 'records filtered',
		path: '/records?process=GTAW&family=carbon-steel&tmin=1%2F16&tmax=1%2F4',
		headers: { cookie }
	},
	...(booth
		? [
				{ id: 'booth-out', name: 'booth (signed out)', path: `/b/${booth.token}` },
				{
					id: 'booth-welder',
					name: 'booth (welder)',
					path: `/b/${booth.token}`,
					headers: { cookie: welder }
				}
			]
		: [])
];
const routes = only ? allRoutes.filter((r) => only.includes(r.id!)) : allRoutes;
// The server's own CPU (user + system) from the kernel: unlike the profile's samples it does not
// count time the process waited for a core while other work ran on the machine. Linux only.
const cpuMsOfServer = (): number | null => {
	try {
		const stat = readFileSync(`/proc/${server.pid}/stat`, 'utf8');
		const f = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
		return ((Number(f[11]) + Number(f[12])) * 1000) / 100; // utime + stime, at 100 ticks a second
	} catch {
		return null;
	}
};
const windows: { name: string; requests: number; w: Window; cpuMs: number | null }[] = [];
for (const r of routes) {
	const fromUs = nowUs();
	const cpuFrom = cpuMsOfServer();
	const res = await load(origin, r, { seconds: SECONDS, connections: 10 });
	const cpuTo = cpuMsOfServer();
	windows.push({
		name: r.name,
		requests: res.requests,
		w: { fromUs, toUs: nowUs() },
		cpuMs: cpuFrom === null || cpuTo === null ? null : cpuTo - cpuFrom
	});
	console.log(
		`${r.name.padEnd(20)} ${String(res.reqPerSec).padStart(6)} req/s  p99 ${res.p99Ms} ms  non-2xx ${res.non2xx}`
	);
}
const exited = new Promise((r) => server.once('exit', r));
server.kill('SIGTERM');
await exited;
if (!process.env.PROFILE_KEEP) rmSync(dataDir, { recursive: true, force: true });
else console.log('kept', dataDir);

const file = readdirSync(outDir).find((f) => f.endsWith('.cpuprofile'));
if (!file) throw new Error(`No .cpuprofile in ${outDir}`);
const profile = JSON.parse(readFileSync(join(outDir, file), 'utf8'));
// Server CPU per answered request, each route over its own load window (the machine may be busy
// with other work: CPU per request holds where req/s does not).
for (const { name, requests, w, cpuMs } of windows) {
	const per = (ms: number) => (ms / Math.max(requests, 1)).toFixed(2);
	const kernel = cpuMs === null ? '' : `, ${per(cpuMs)} ms by the kernel's count`;
	console.log(
		`\n${name}: ${per(busyMs(profile, w))} ms CPU per request by the profile${kernel} (${requests} requests)`
	);
	for (const row of topCosts(profile, 15, 'function', w)) console.log(row);
	console.log('  by package:');
	for (const row of topCosts(profile, 6, 'package', w)) console.log(row);
}
console.log(`\nTop self time over all routes (${join(outDir, file)}):`);
for (const row of topCosts(profile, 25)) console.log(row);
console.log('\nBy package (self time):');
for (const row of topCosts(profile, 15, 'package')) console.log(row);
process.exit(0);
