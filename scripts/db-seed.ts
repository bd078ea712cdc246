// npm run db:seed — adds the invented demo shops (idempotent), only to a demo, development or
// test database: their people sign in with known demo passwords (see seed-guard.ts).
import { config } from '../src/lib/server/config';
import { demoSeedRefusal } from '../src/lib/server/seed/seed-guard';

const refusal = demoSeedRefusal({
	demo: config.isDemo,
	nodeEnv: config.nodeEnv,
	databaseFile: config.databaseFile
});
if (refusal) {
	console.error(refusal);
	process.exit(1);
}

const { exitOnConfigError, migrate, sequelize } = await import('../src/lib/server/db');
const { seedDemo } = await import('../src/lib/server/seed/seed-demo');
const { orExit } = await import('../src/lib/server/config-error');
const { checkStorage, closeStorage } = await import('../src/lib/server/storage/select');
await migrate().catch(exitOnConfigError);
// The demo's photos and reports go to the store: a bad bucket stops here with one sentence.
await orExit(checkStorage);
const { shop, other } = await seedDemo();
console.log(`Seeded ${shop.name} and ${other.name}.`);
await closeStorage();
await sequelize.close();
