// npm test — everything CI checks, in order: types, lint, unit tests, build, end-to-end in Chromium.
import { execSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

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

const steps: Array<[string, string[]]> = [
	['types', ['npm', 'run', 'check']],
	['lint', ['npm', 'run', 'lint']],
	['unit', ['npx', 'vitest', 'run']],
	['build', ['npx', 'vite', 'build', '--logLevel', 'warn']],
	['end-to-end', ['npx', 'playwright', 'test']]
];

ensureChromium();
const started = Date.now();
for (const [name, [cmd, ...args]] of steps) {
	const t = Date.now();
	console.log(`\n▶ ${name}: ${[cmd, ...args].join(' ')}`);
	const r = spawnSync(cmd!, args, { stdio: 'inherit', env: { ...process.env, FORCE_COLOR: '0' } });
	if (r.status !== 0) {
		console.error(`\n✖ ${name} failed (exit ${r.status ?? r.signal}).`);
		process.exit(r.status ?? 1);
	}
	console.log(`✔ ${name} in ${((Date.now() - t) / 1000).toFixed(0)} s`);
}
console.log(`\nAll steps passed in ${((Date.now() - started) / 1000).toFixed(0)} s.`);
