// Every property test (fast-check) in the unit suite runs from one seed a test file, so a failure
// can be replayed: the seed is printed beside the failure and FC_SEED=<seed> runs it again.
// Loaded by vitest as a setup file (vite.config.ts), so no test has to remember to call it.
import fc from 'fast-check';
import { afterEach } from 'vitest';

/** FC_SEED when it is a whole number, otherwise a fresh seed (a 32-bit integer, as fast-check takes). */
export function fastCheckSeed(env: string | undefined = process.env.FC_SEED): number {
	const given = Number(env);
	if (env !== undefined && env.trim() !== '' && Number.isSafeInteger(given)) return given | 0;
	return (Date.now() ^ (Math.random() * 0x7fffffff)) | 0;
}

export const FC_SEED = fastCheckSeed();
fc.configureGlobal({ seed: FC_SEED });

afterEach((ctx) => {
	if (ctx.task.result?.state === 'fail')
		console.error(
			`[fast-check] ${ctx.task.name}: replay with FC_SEED=${FC_SEED} npx vitest run ${ctx.task.file?.name ?? ''}`
		);
});
