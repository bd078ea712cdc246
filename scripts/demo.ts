// npm run demo — build, migrate, seed the demo shop, start the mail catcher and serve the app.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import {
	prepareDatabase,
	printBanner,
	stackEnv,
	startCatcher,
	startChild,
	waitForHttp
} from './lib/local-stack';
import { serverArgs } from './lib/server-process';

const port = Number(process.env.PORT ?? 4173);
stackEnv({
	dataDir: process.env.DATA_DIR ?? 'data',
	port,
	smtpPort: Number(process.env.SMTP_PORT ?? 2525)
});
process.env.BEADLINE_DEMO = '1';

if (!process.argv.includes('--no-build') || !existsSync('build/index.js')) {
	const built = spawnSync('npx', ['vite', 'build', '--logLevel', 'warn'], { stdio: 'inherit' });
	if (built.status !== 0) process.exit(built.status ?? 1);
}
await prepareDatabase({ seed: true });
await startCatcher();
startChild(process.execPath, serverArgs('build/index.js'));
await waitForHttp(`http://127.0.0.1:${port}/signin`);
await printBanner(process.env.ORIGIN ?? `http://localhost:${port}`);
