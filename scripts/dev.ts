// npm run dev — the Vite dev server with the same database, seed and mail catcher as the demo.
import {
	prepareDatabase,
	printBanner,
	stackEnv,
	startCatcher,
	startChild
} from './lib/local-stack';

const port = Number(process.env.PORT ?? 5173);
stackEnv({
	dataDir: process.env.DATA_DIR ?? 'data',
	port,
	smtpPort: Number(process.env.SMTP_PORT ?? 2525)
});
await prepareDatabase({ seed: true });
await startCatcher();
startChild('npx', ['vite', 'dev', '--port', String(port), '--strictPort']);
await printBanner(process.env.ORIGIN ?? `http://localhost:${port}`);
