// Demo passwords are never used outside the demo (issue 2). `npm run demo`, `npm run dev` and the
// end-to-end server seed their own data folders; the stand-alone `npm run db:seed` writes into
// whatever DATABASE_FILE names, so it asks for a demo, development or test environment first.

export interface SeedEnvironment {
	/** `config.isDemo`: BEADLINE_DEMO=1. */
	demo: boolean;
	nodeEnv: string | undefined;
	databaseFile: string;
}

const SEEDABLE = ['development', 'test'];

/** Why seeding the demo shops is refused here, or null when this is a demo, dev or test setup. */
export function demoSeedRefusal(env: SeedEnvironment): string | null {
	const nodeEnv = (env.nodeEnv ?? '').trim().toLowerCase();
	if (env.demo || SEEDABLE.includes(nodeEnv)) return null;
	const why = nodeEnv === '' ? 'NODE_ENV is not set' : `NODE_ENV is "${env.nodeEnv}"`;
	return [
		`Refusing to seed ${env.databaseFile}: the demo shops sign in with known demo passwords,`,
		`and this is not a demo, development or test environment (BEADLINE_DEMO is not 1 and ${why}).`,
		'For a demo or development database run BEADLINE_DEMO=1 npm run db:seed;',
		'npm run demo and npm run dev seed their own data folder.'
	].join('\n');
}
