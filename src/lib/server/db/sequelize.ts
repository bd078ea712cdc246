import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import pg from 'pg';
import { Sequelize, type Options } from 'sequelize';
import { config } from '../config';
import type { DatabaseTarget } from './database-url';
import { sqliteDriver } from './sqlite-driver';

/** How long a PostgreSQL connection attempt may take before start-up says the server is unreachable. */
export const CONNECT_TIMEOUT_MS = 5000;

const common = { logging: false, define: { underscored: true } } satisfies Options;

/** A Sequelize instance for `db` (the process's own is `sequelize` below; db:copy opens two). */
export function openSequelize(db: DatabaseTarget): Sequelize {
	if (db.kind === 'postgres')
		return new Sequelize(db.url, {
			...common,
			dialect: 'postgres',
			dialectModule: pg,
			dialectOptions: { connectionTimeoutMillis: CONNECT_TIMEOUT_MS },
			// Each write transaction holds one connection for its length; reads borrow one briefly.
			pool: { max: Number(process.env.DATABASE_POOL_MAX) || 10, acquire: 60_000 }
		} satisfies Options);
	if (db.kind === 'invalid')
		// Never used: checkDatabase() refuses to start and says why. Models still need an instance.
		return new Sequelize({
			...common,
			dialect: 'sqlite',
			dialectModule: sqliteDriver,
			storage: ':memory:'
		});
	mkdirSync(dirname(db.file), { recursive: true });
	return new Sequelize({
		...common,
		dialect: 'sqlite',
		dialectModule: sqliteDriver,
		storage: db.file
		// Sequelize's SQLite dialect turns foreign_keys on for every connection it opens.
	} satisfies Options);
}

/** The one Sequelize instance of the process (Vite's dev reloads keep it on globalThis). */
const holder = globalThis as unknown as { __beadlineSequelize?: Sequelize };
export const sequelize: Sequelize = (holder.__beadlineSequelize ??= openSequelize(config.database));
