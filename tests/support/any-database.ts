// The test's own read-only look at the app's database, whichever it is: the SQLite file
// (DATABASE_FILE) or PostgreSQL (DATABASE_URL=postgres://…), both through Sequelize so one query
// with `?` placeholders runs on either.
import { QueryTypes, Sequelize } from 'sequelize';

export interface AnyDatabase {
	dialect: 'sqlite' | 'postgres';
	all<T extends object>(sql: string, params?: unknown[]): Promise<T[]>;
	one<T extends object>(sql: string, params?: unknown[]): Promise<T | undefined>;
	/** What the database itself says is wrong (SQLite's integrity and foreign key checks). */
	integrityProblems(): Promise<string[]>;
	close(): Promise<void>;
}

export function openAnyDatabase(env: NodeJS.ProcessEnv): AnyDatabase {
	const url = env.DATABASE_URL ?? '';
	const postgres = /^postgres(ql)?:\/\//.test(url);
	const sequelize = postgres
		? new Sequelize(url, { dialect: 'postgres', logging: false })
		: new Sequelize({ dialect: 'sqlite', storage: env.DATABASE_FILE, logging: false });
	const all = <T extends object>(sql: string, params: unknown[] = []) =>
		sequelize.query<T>(sql, { replacements: params, type: QueryTypes.SELECT });
	return {
		dialect: postgres ? 'postgres' : 'sqlite',
		all,
		one: async (sql, params) => (await all(sql, params))[0] as never,
		async integrityProblems() {
			if (postgres) return []; // PostgreSQL enforces its constraints on every write itself
			const problems: string[] = [];
			const ic = await all<{ integrity_check: string }>('PRAGMA integrity_check');
			if (ic.map((r) => r.integrity_check).join() !== 'ok')
				problems.push(`integrity_check: ${JSON.stringify(ic)}`);
			const fk = await all('PRAGMA foreign_key_check');
			if (fk.length) problems.push(`foreign_key_check: ${JSON.stringify(fk.slice(0, 5))}`);
			return problems;
		},
		close: () => sequelize.close()
	};
}
