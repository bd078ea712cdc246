// The first contact with the database at start-up. What can go wrong with the configuration (a
// malformed DATABASE_URL, a server that does not answer, a refused password, a missing
// database) becomes one sentence naming the variable, so the operator knows what to change.
import type { Sequelize } from 'sequelize';
import { config } from '../config';
import { ConfigError } from '../config-error';
import type { DatabaseTarget } from './database-url';
import { sqlState } from './dialect';
import { sequelize } from './sequelize';

/** A database configuration problem: its message is the whole story and is shown without a stack. */
export class DatabaseConfigError extends ConfigError {
	override name = 'DatabaseConfigError';
}

/** The code of the driver error under Sequelize's wrapper (ECONNREFUSED, 28P01, SQLITE_CANTOPEN…). */
function codeOf(e: unknown): string {
	const err = e as { parent?: { code?: unknown }; original?: { code?: unknown }; name?: string };
	return String(sqlState(e) ?? err?.parent?.code ?? err?.original?.code ?? err?.name ?? '');
}

/** The sentence for a failed first connection to PostgreSQL at `display` (a redacted URL). */
export function postgresProblem(e: unknown, display: string, name = 'DATABASE_URL'): string {
	const code = codeOf(e);
	const message = String((e as Error)?.message ?? e);
	const host = (() => {
		const u = new URL(display);
		return `${u.hostname}:${u.port || 5432}`;
	})();
	if (
		/^(ECONNREFUSED|ETIMEDOUT|EHOSTUNREACH|ENETUNREACH|ECONNRESET)$/.test(code) ||
		/Connection(Refused|TimedOut)Error|HostNotReachableError/.test(code) ||
		/timeout|timed out|terminated/i.test(message)
	)
		return `${name} names a PostgreSQL server at ${host} that does not answer: start it, or correct the host and port.`;
	if (/^(ENOTFOUND|EAI_AGAIN)$/.test(code) || code === 'HostNotFoundError')
		return `${name} names the host ${host.replace(/:\d+$/, '')}, which cannot be found: correct the host name.`;
	if (code === '28P01' || code === '28000' || /password|authentication/i.test(message))
		return `${name}'s user name or password was refused by the PostgreSQL server at ${host}: correct the credentials.`;
	if (code === '3D000')
		return `${name} names a database that does not exist on the PostgreSQL server at ${host}: create it (createdb) or correct the name.`;
	return `${name} (${display}) could not be opened: ${message.replace(/\s+/g, ' ').slice(0, 200)}.`;
}

/**
 * Refuses a bad configuration with a DatabaseConfigError; resolves once the database answers.
 * By default the process's own database; db:copy passes its source and target (named --from, --to).
 */
export async function checkDatabase(
	s: Sequelize = sequelize,
	db: DatabaseTarget = config.database,
	name = 'DATABASE_URL'
): Promise<void> {
	if (db.kind === 'invalid') throw new DatabaseConfigError(db.problem);
	try {
		await s.authenticate();
	} catch (e) {
		if (db.kind === 'postgres') throw new DatabaseConfigError(postgresProblem(e, db.display, name));
		throw new DatabaseConfigError(
			`The SQLite file ${db.file} (${name === 'DATABASE_URL' ? 'DATABASE_URL or DATABASE_FILE' : name}) could not be opened: ${codeOf(e) || (e as Error).message}.`
		);
	}
}

/**
 * For entry points (server start, scripts): `await migrate().catch(exitOnConfigError)`. A
 * ConfigError (DatabaseConfigError, or storage's) is printed as its one sentence and the process stops with status 1;
 * anything else is thrown on to the usual handling.
 */
export function exitOnConfigError(e: unknown): never {
	if (e instanceof ConfigError) {
		console.error(e.message);
		process.exit(1);
	}
	throw e;
}
