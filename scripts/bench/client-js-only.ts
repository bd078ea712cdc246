// npm run bench:js [-- --no-build --files]
// The bench's client-bundle part alone (measureClientJs, the same pages and roles as
// scripts/bench.ts) on the demo's seeded data: for working on the bundle without the whole bench's
// load runs. Uses BUILD_DIR / KIT_OUT_DIR like the bench; --files lists each script a page loaded.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { prepareDatabase, stackEnv, startCatcher } from '../lib/local-stack';
import { serverArgs } from '../lib/server-process';
import { openSqlite } from '../lib/sqlite-file';
import { benchPages, measureClientJs } from './client-js';
import { signInCookie, waitFor } from './http';
import { freePort } from './ports';
import { benchPerson } from './prepare';

const flag = (name: string) => process.argv.includes(name);
const buildDir = process.env.BUILD_DIR ?? 'build';
if (!flag('--no-build') || !existsSync(`${buildDir}/index.js`)) {
	const built = spawnSync('npx', ['vite', 'build', '--logLevel', 'warn'], { stdio: 'inherit' });
	if (built.status !== 0) process.exit(built.status ?? 1);
}

// A BUILD_DIR outside the work tree finds no node_modules beside it (DEVELOPERS.md).
if (!existsSync(join(buildDir, 'node_modules')) && !resolve(buildDir).startsWith(process.cwd()))
	symlinkSync(resolve('node_modules'), join(buildDir, 'node_modules'));

const dataDir = mkdtempSync(join(tmpdir(), 'beadline-client-js-'));
const port = await freePort();
stackEnv({ dataDir, port, smtpPort: await freePort() });
Object.assign(process.env, { BEADLINE_JOBS: 'off', SHUTDOWN_TIMEOUT: '2' });
const origin = `http://localhost:${port}`;
await prepareDatabase({ seed: true });
await startCatcher();
const server = spawn(process.execPath, serverArgs(`${buildDir}/index.js`), {
	env: process.env,
	stdio: ['ignore', 'ignore', 'inherit']
});
try {
	await waitFor(`${origin}/api/v1/health`);
	const as = (role: string) =>
		signInCookie(origin, benchPerson(role).email, benchPerson(role).password);
	const [engineer, welder] = [await as('engineer'), await as('welder')];
	const db = await openSqlite(process.env.DATABASE_FILE!, { readonly: true });
	const link = await db.get<{ token: string }>(
		'SELECT token FROM booth_links WHERE revoked_at IS NULL ORDER BY id DESC'
	);
	await db.close();
	const booth = link && `/b/${link.token}`;
	const pages = await measureClientJs(origin, benchPages({ welder, engineer, booth }));
	for (const p of pages) {
		console.log(
			`${p.name.padEnd(22)} ${String(p.kb).padStart(6)} KB ${String(p.files).padStart(3)} files` +
				(p.qrDecoder ? '  (QR decoder)' : '')
		);
		if (flag('--files'))
			for (const s of p.scripts ?? [])
				console.log(
					`    ${(s.bytes / 1024).toFixed(1).padStart(6)} KB  ${s.url.replace(origin, '')}`
				);
	}
} finally {
	server.kill('SIGTERM');
	rmSync(dataDir, { recursive: true, force: true });
}
process.exit(0);
