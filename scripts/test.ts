// npm test — everything CI checks, in order: types, lint, unit tests (on SQLite, then the data
// layer's again on PostgreSQL), build, end-to-end in Chromium.
import { execSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { postgresBinDir } from './lib/postgres';
import { unexpectedBuildLines } from './lib/build-output';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

function ensureChromium(): void {
	if (existsSync(CHROMIUM)) return;
	const root = process.getuid?.() === 0;
	const apt = spawnSync('sh', ['-c', 'command -v apt-get'], { encoding: 'utf8' }).stdout.trim();
	if (!root || !apt) {
		console.error(
			`No Chromium at ${CHROMIUM}. Install Debian's package (sudo apt-get install -y chromium) ` +
				'or set CHROMIUM_PATH to a Chromium binary, then run npm test again.'
		);
		process.exit(1);
	}
	console.log('Installing Debian chromium for the end-to-end tests…');
	execSync('apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium', {
		stdio: 'inherit'
	});
}

/** The unit tests' PostgreSQL run starts a throw-away cluster of Debian's server (scripts/lib/postgres.ts). */
function ensurePostgres(): void {
	if (postgresBinDir()) return;
	const root = process.getuid?.() === 0;
	const apt = spawnSync('sh', ['-c', 'command -v apt-get'], { encoding: 'utf8' }).stdout.trim();
	if (!root || !apt) {
		console.error(
			"No PostgreSQL server (initdb, pg_ctl) for the PostgreSQL unit tests. Install Debian's " +
				'package (sudo apt-get install -y postgresql), then run npm test again.'
		);
		process.exit(1);
	}
	console.log('Installing Debian postgresql for the PostgreSQL unit tests…');
	// The package starts a system cluster of its own; the tests never use it (their own port and folder).
	execSync(
		'apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql',
		{
			stdio: 'inherit'
		}
	);
}

const steps: Array<[string, string[]]> = [
	['types', ['npm', 'run', 'check']],
	['lint', ['npm', 'run', 'lint']],
	['unit', ['npx', 'vitest', 'run']],
	['unit on PostgreSQL', ['npx', 'vitest', 'run', '--config', 'vitest.postgres.config.ts']],
	['build', ['npx', 'vite', 'build', '--logLevel', 'warn']],
	['end-to-end', ['npx', 'playwright', 'test']]
];

ensureChromium();
ensurePostgres();
const started = Date.now();
for (const [name, [cmd, ...args]] of steps) {
	const t = Date.now();
	console.log(`\n▶ ${name}: ${[cmd, ...args].join(' ')}`);
	const env = { ...process.env, FORCE_COLOR: '0' };
	// The build's output is read, not only shown: a build that warns fails like one that errs.
	const quiet = name === 'build';
	const r = spawnSync(cmd!, args, {
		stdio: quiet ? 'pipe' : 'inherit',
		encoding: 'utf8',
		maxBuffer: 64 * 1024 * 1024,
		env
	});
	if (quiet) process.stdout.write(`${r.stdout ?? ''}${r.stderr ?? ''}`);
	if (r.status !== 0) {
		console.error(`\n✖ ${name} failed (exit ${r.status ?? r.signal}).`);
		process.exit(r.status ?? 1);
	}
	const noise = quiet ? unexpectedBuildLines(`${r.stdout ?? ''}\n${r.stderr ?? ''}`) : [];
	if (noise.length) {
		console.error(`\n✖ ${name} printed ${noise.length} line(s) of warnings:\n${noise.join('\n')}`);
		process.exit(1);
	}
	console.log(`✔ ${name} in ${((Date.now() - t) / 1000).toFixed(0)} s`);
}
console.log(`\nAll steps passed in ${((Date.now() - started) / 1000).toFixed(0)} s.`);
