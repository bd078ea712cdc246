import { DataTypes, type QueryInterface } from 'sequelize';
import { appendOnly } from '../dialect';

const timestamps = {
	created_at: { type: DataTypes.DATE, allowNull: false },
	updated_at: { type: DataTypes.DATE, allowNull: false }
};

export async function up({ context: q }: { context: QueryInterface }) {
	await q.createTable('shops', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		name: { type: DataTypes.STRING(120), allowNull: false },
		unit_system: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'imperial' },
		...timestamps
	});
	await q.createTable('users', {
		id: { type: DataTypes.UUID, primaryKey: true },
		shop_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'shops', key: 'id' },
			onDelete: 'RESTRICT'
		},
		name: { type: DataTypes.STRING(120), allowNull: false },
		email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
		email_verified: { type: DataTypes.DATE, allowNull: true },
		image: { type: DataTypes.STRING, allowNull: true },
		role: { type: DataTypes.STRING(20), allowNull: false },
		active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
		session_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
		password_hash: { type: DataTypes.STRING(100), allowNull: true },
		unit_system: { type: DataTypes.STRING(10), allowNull: true },
		...timestamps
	});
	await q.addIndex('users', ['shop_id', 'role']);

	// Auth.js adapter tables (column names as its models define them, underscored).
	await q.createTable('accounts', {
		id: { type: DataTypes.UUID, primaryKey: true },
		type: { type: DataTypes.STRING, allowNull: false },
		provider: { type: DataTypes.STRING, allowNull: false },
		provider_account_id: { type: DataTypes.STRING, allowNull: false },
		refresh_token: DataTypes.STRING,
		access_token: DataTypes.STRING,
		expires_at: DataTypes.INTEGER,
		token_type: DataTypes.STRING,
		scope: DataTypes.STRING,
		id_token: DataTypes.TEXT,
		session_state: DataTypes.STRING,
		user_id: {
			type: DataTypes.UUID,
			references: { model: 'users', key: 'id' },
			onDelete: 'CASCADE'
		}
	});
	await q.createTable('sessions', {
		id: { type: DataTypes.UUID, primaryKey: true },
		expires: { type: DataTypes.DATE, allowNull: false },
		session_token: { type: DataTypes.STRING, allowNull: false, unique: true },
		user_id: {
			type: DataTypes.UUID,
			references: { model: 'users', key: 'id' },
			onDelete: 'CASCADE'
		}
	});
	await q.createTable('verification_tokens', {
		token: { type: DataTypes.STRING, primaryKey: true },
		identifier: { type: DataTypes.STRING, allowNull: false },
		expires: { type: DataTypes.DATE, allowNull: false }
	});

	await q.createTable('invites', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'shops', key: 'id' }
		},
		email: { type: DataTypes.STRING(254), allowNull: false },
		name: { type: DataTypes.STRING(120), allowNull: false },
		role: { type: DataTypes.STRING(20), allowNull: false },
		token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
		expires_at: { type: DataTypes.DATE, allowNull: false },
		used_at: { type: DataTypes.DATE, allowNull: true },
		invited_by_id: {
			type: DataTypes.UUID,
			allowNull: false,
			references: { model: 'users', key: 'id' }
		},
		...timestamps
	});

	await q.createTable('audit_events', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: {
			type: DataTypes.INTEGER,
			allowNull: true,
			references: { model: 'shops', key: 'id' }
		},
		actor_id: { type: DataTypes.UUID, allowNull: true },
		actor_name: { type: DataTypes.STRING(120), allowNull: false },
		action: { type: DataTypes.STRING(60), allowNull: false },
		object_type: { type: DataTypes.STRING(40), allowNull: false },
		object_id: { type: DataTypes.STRING(64), allowNull: true },
		before: { type: DataTypes.TEXT, allowNull: true },
		after: { type: DataTypes.TEXT, allowNull: true },
		ip: { type: DataTypes.STRING(64), allowNull: true },
		user_agent: { type: DataTypes.STRING(300), allowNull: true },
		at: { type: DataTypes.DATE, allowNull: false }
	});
	await q.addIndex('audit_events', ['shop_id', 'at']);
	await q.addIndex('audit_events', ['object_type', 'object_id']);
	// The trail is append-only: the database itself refuses to rewrite or remove history.
	// (SQLite: two RAISE(ABORT) triggers, as shipped; PostgreSQL: see dialect.ts.)
	await appendOnly(q, 'audit_events', 'audit events are append-only', '\n\t\t');
}

export async function down({ context: q }: { context: QueryInterface }) {
	for (const table of [
		'audit_events',
		'invites',
		'verification_tokens',
		'sessions',
		'accounts',
		'users',
		'shops'
	]) {
		await q.dropTable(table);
	}
}
