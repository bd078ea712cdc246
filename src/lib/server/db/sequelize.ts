import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { Sequelize, type Options } from 'sequelize';
import { config } from '../config';
import { sqliteDriver } from './sqlite-driver';

function open(): Sequelize {
	const storage = config.databaseFile;
	mkdirSync(dirname(storage), { recursive: true });
	return new Sequelize({
		dialect: 'sqlite',
		dialectModule: sqliteDriver,
		storage,
		// Sequelize's SQLite dialect turns foreign_keys on for every connection it opens.
		logging: false,
		define: { underscored: true }
	} satisfies Options);
}

/** The one Sequelize instance of the process (Vite's dev reloads keep it on globalThis). */
const holder = globalThis as unknown as { __beadlineSequelize?: Sequelize };
export const sequelize: Sequelize = (holder.__beadlineSequelize ??= open());
