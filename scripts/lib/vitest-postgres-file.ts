// vitest setupFile of the PostgreSQL run: before each test file imports the data layer, point
// DATABASE_URL at a fresh copy of the migrated template (the file's DATABASE_FILE is then unused).
import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { inject } from 'vitest';

const admin = inject('postgresAdminUrl');
const name = `t_${randomBytes(6).toString('hex')}`;
const client = new pg.Client({ connectionString: admin });
await client.connect();
try {
	await client.query(`CREATE DATABASE "${name}" TEMPLATE "${inject('postgresTemplate')}"`);
} finally {
	await client.end();
}
const url = new URL(admin);
url.pathname = `/${name}`;
process.env.DATABASE_URL = url.href;
