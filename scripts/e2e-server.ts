// Started by Playwright's webServer: the built app on E2E_PORT with a throw-away data folder.
import { existsSync } from 'node:fs';
import { prepareDatabase, stackEnv, startCatcher, startChild } from './lib/local-stack';
import { serverArgs } from './lib/server-process';

const port = Number(process.env.E2E_PORT);
const smtpPort = Number(process.env.E2E_SMTP_PORT);
const dataDir = process.env.E2E_DATA_DIR;
if (!port || !smtpPort || !dataDir)
	throw new Error('E2E_PORT, E2E_SMTP_PORT and E2E_DATA_DIR are set by playwright.config.ts');
const buildDir = process.env.BUILD_DIR ?? 'build';
if (!existsSync(`${buildDir}/index.js`)) throw new Error('Build the app first: npx vite build');

stackEnv({ dataDir, port, smtpPort });
// Every test signs in from 127.0.0.1: the per-address caps would throttle the suite, not an
// attacker. The lift is test-only: it counts with NODE_ENV=test and nowhere else (address-caps.ts).
process.env.NODE_ENV = 'test';
process.env.TEST_ONLY_LIFT_ADDRESS_CAPS = '1';
// The reminder job runs when a test runs it, so no test finds a notice it did not ask for.
process.env.BEADLINE_JOBS = 'off';
await prepareDatabase({ seed: true });
await startCatcher();
startChild(process.execPath, serverArgs(`${buildDir}/index.js`));
