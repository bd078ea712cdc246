// A setting that stops start-up. Its message is one sentence naming the variable; start-up code
// prints it alone (no stack: the trace would only hide the sentence) and exits. The database's
// DatabaseConfigError (db/connect.ts) is one of these, so either helper handles both.
export class ConfigError extends Error {
	constructor(message: string) {
		super(message);
		this.name = 'ConfigError';
	}
}

/** Runs a start-up step; a ConfigError ends the process with its one sentence, status 1. */
export async function orExit<T>(step: () => Promise<T>): Promise<T> {
	try {
		return await step();
	} catch (e) {
		if (!(e instanceof ConfigError)) throw e;
		console.error(e.message);
		process.exit(1);
	}
}
