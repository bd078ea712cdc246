import { DataTypes, type QueryInterface } from 'sequelize';

export async function up({ context: q }: { context: QueryInterface }) {
	await q.createTable('api_tokens', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'shops', key: 'id' }
		},
		name: { type: DataTypes.STRING(80), allowNull: false },
		role: { type: DataTypes.STRING(20), allowNull: false },
		token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
		prefix: { type: DataTypes.STRING(16), allowNull: false },
		created_by_id: {
			type: DataTypes.UUID,
			allowNull: false,
			references: { model: 'users', key: 'id' }
		},
		last_used_at: { type: DataTypes.DATE, allowNull: true },
		revoked_at: { type: DataTypes.DATE, allowNull: true },
		created_at: { type: DataTypes.DATE, allowNull: false },
		updated_at: { type: DataTypes.DATE, allowNull: false }
	});
	await q.addIndex('api_tokens', ['shop_id']);
}

export async function down({ context: q }: { context: QueryInterface }) {
	await q.dropTable('api_tokens');
}
