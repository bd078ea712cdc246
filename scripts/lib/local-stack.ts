// The pieces `npm run demo`, `npm run dev` and the end-to-end server share: one data folder with
// the SQLite file, the caught mail and uploads; the mail catcher; and a server child process.
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';

export interface StackEnv {
	dataDir: string;
	port: number;
	smtpPort: number;
}

/** Sets the environment every part reads (src/lib/server/config.ts), before any of it is imported. */
export function stackEnv({ dataDir, port, smtpPort }: StackEnv): NodeJS.ProcessEnv {
	const dir = resolve(dataDir);
	mkdirSync(dir, { recursive: true });
	const env = {
		DATA_DIR: dir,
		DATABASE_FILE: join(dir, 'beadline.sqlite'),
		UPLOADS_DIR: join(dir, 'uploads'),
		MAIL_CATCHER_DIR: join(dir, 'mail'),
		SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
		ORIGIN: `http://localhost:${port}`,
		PORT: String(port),
		HOST: '127.0.0.1',
		BODY_SIZE_LIMIT: '80M'
	};
	for (const [key, value] of Object.entries(env)) process.env[key] ??= value;
	return process.env;
}

export async function prepareDatabase(opts: { seed: boolean }): Promise<void> {
	const { exitOnConfigError, migrate, sequelize } = await import('../../src/lib/server/db');
	await migrate().catch(exitOnConfigError);
	if (opts.seed) {
		const { orExit } = await import('../../src/lib/server/config-error');
		const { checkStorage, closeStorage } = await import('../../src/lib/server/storage/select');
		// The demo's photos and reports go to the store: a bad bucket stops here, in one sentence.
		await orExit(checkStorage);
		const { seedDemo } = await import('../../src/lib/server/seed/seed-demo');
		await seedDemo();
		await closeStorage();
	}
	await sequelize.close();
}

export async function startCatcher(): Promise<void> {
	const { startMailCatcher } = await import('../../src/lib/server/mail/catcher');
	const port = Number(new URL(process.env.SMTP_URL ?? '').port);
	await startMailCatcher({ port, dir: process.env.MAIL_CATCHER_DIR ?? 'data/mail' });
}

export function startChild(command: string, args: string[]): ChildProcess {
	const child = spawn(command, args, { env: process.env, stdio: ['ignore', 'inherit', 'inherit'] });
	for (const signal of ['SIGINT', 'SIGTERM'] as const) {
		process.on(signal, () => {
			child.kill(signal);
			process.exit(0);
		});
	}
	child.on('exit', (code) => process.exit(code ?? 0));
	return child;
}

export async function waitForHttp(url: string, timeoutMs = 60_000): Promise<void> {
	const until = Date.now() + timeoutMs;
	while (Date.now() < until) {
		try {
			const res = await fetch(url, { redirect: 'manual' });
			if (res.status < 500) return;
		} catch {
			// not listening yet
		}
		await new Promise((r) => setTimeout(r, 250));
	}
	throw new Error(`No answer from ${url} within ${timeoutMs / 1000} s`);
}

export async function printBanner(origin: string): Promise<void> {
	const { DEMO_PEOPLE, DEMO_SHOP } = await import('../../src/lib/server/seed/demo-people');
	const width = Math.max(...DEMO_PEOPLE.map((p) => p.email.length));
	console.log(`\n  Beadline is running: ${origin}/signin\n  Demo shop: ${DEMO_SHOP}\n`);
	for (const p of DEMO_PEOPLE)
		console.log(`  ${p.role.padEnd(10)} ${p.email.padEnd(width)}  ${p.password}`);
	console.log(`\n  Caught mail (invites, sign-in links): ${origin}/admin/mail (as the admin)`);
	console.log('  Demo passwords are for this local demo only. Stop with Ctrl+C.\n');
}
