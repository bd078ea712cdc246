import { DataTypes, type QueryInterface } from 'sequelize';

// Continuity taps received from a phone (issue #16): a tap made offline waits in the phone's
// queue with an id the phone made, and may arrive twice (a retry after a lost answer). One row a
// tap id and person, unique, so the server takes each id once and remembers what it answered.
export async function up({ context: q }: { context: QueryInterface }) {
	await q.createTable('continuity_taps', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'shops', key: 'id' }
		},
		user_id: {
			type: DataTypes.UUID,
			allowNull: false,
			references: { model: 'users', key: 'id' }
		},
		// Made by the phone (a UUID); unique per person with the index below.
		client_id: { type: DataTypes.STRING(64), allowNull: false },
		link_id: {
			type: DataTypes.INTEGER,
			allowNull: true,
			references: { model: 'booth_links', key: 'id' }
		},
		continuity_entry_id: {
			type: DataTypes.INTEGER,
			allowNull: true,
			references: { model: 'continuity_entries', key: 'id' }
		},
		// 'logged' (a new entry), 'already' (the day was logged before), 'refused'.
		outcome: { type: DataTypes.STRING(12), allowNull: false },
		message: { type: DataTypes.STRING(300), allowNull: true },
		made_at: { type: DataTypes.DATE, allowNull: false },
		received_at: { type: DataTypes.DATE, allowNull: false }
	});
	await q.addConstraint('continuity_taps', {
		type: 'unique',
		fields: ['user_id', 'client_id'],
		name: 'continuity_taps_user_client_unique'
	});
	await q.addIndex('continuity_taps', ['shop_id', 'received_at']);
}

export async function down({ context: q }: { context: QueryInterface }) {
	await q.dropTable('continuity_taps');
}
