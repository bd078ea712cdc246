import type { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { checkDatabase } from './connect';
import { afterMigrations, beforeMigrations, withMigrationLock } from './dialect';
import { migrations } from './migrations';
import { sequelize } from './sequelize';

function umzug(s: Sequelize) {
	return new Umzug({
		migrations,
		context: s.getQueryInterface(),
		storage: new SequelizeStorage({ sequelize: s, tableName: 'schema_migrations' }),
		logger: undefined
	});
}

/** Applies the pending migrations to `s` (checked and reachable); the names applied. */
export async function migrateDatabase(s: Sequelize): Promise<string[]> {
	await beforeMigrations(s);
	const applied = await withMigrationLock(s, () => umzug(s).up());
	await afterMigrations(s);
	return applied.map((m) => m.name);
}

/** The migrations `s` has not had yet. */
export async function pendingMigrations(s: Sequelize): Promise<string[]> {
	return (await umzug(s).pending()).map((m) => m.name);
}

let done: Promise<string[]> | undefined;

/**
 * Brings the schema up to date once per process; safe to call from every entry point, and from
 * several processes at once on PostgreSQL. A database that cannot be reached or a bad
 * DATABASE_URL rejects with a DatabaseConfigError (one sentence).
 */
export function migrate(): Promise<string[]> {
	done ??= (async () => {
		await checkDatabase();
		return migrateDatabase(sequelize);
	})();
	return done;
}
