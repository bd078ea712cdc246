import { SequelizeStorage, Umzug } from 'umzug';
import { checkDatabase } from './connect';
import { afterMigrations, beforeMigrations, withMigrationLock } from './dialect';
import { migrations } from './migrations';
import { sequelize } from './sequelize';

function umzug() {
	return new Umzug({
		migrations,
		context: sequelize.getQueryInterface(),
		storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
		logger: undefined
	});
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
		await beforeMigrations(sequelize);
		const applied = await withMigrationLock(sequelize, () => umzug().up());
		await afterMigrations(sequelize);
		return applied.map((m) => m.name);
	})();
	return done;
}
