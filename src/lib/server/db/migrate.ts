import { SequelizeStorage, Umzug } from 'umzug';
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

/** Brings the schema up to date once per process; safe to call from every entry point. */
export function migrate(): Promise<string[]> {
	done ??= (async () => {
		// WAL persists in the file; setting it once per process is enough.
		await sequelize.query('PRAGMA journal_mode=WAL');
		const applied = await umzug().up();
		// SQLite's advice for a long-lived connection: refresh the planner's statistics where they
		// are missing or stale, with a bounded sample so a large file still starts quickly.
		await sequelize.query('PRAGMA analysis_limit=1000');
		await sequelize.query('PRAGMA optimize=0x10002');
		return applied.map((m) => m.name);
	})();
	return done;
}
