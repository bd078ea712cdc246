import { DataTypes, type QueryInterface } from 'sequelize';

// Booth links (issue #6): the short link /b/<token> printed as the QR code of a procedure sheet,
// one live link per approved revision, and the log of lookups made with them.
export async function up({ context: q }: { context: QueryInterface }) {
	const stamps = {
		created_at: { type: DataTypes.DATE, allowNull: false },
		updated_at: { type: DataTypes.DATE, allowNull: false }
	};
	const user = () => ({
		type: DataTypes.UUID,
		allowNull: true,
		references: { model: 'users', key: 'id' }
	});
	await q.createTable('booth_links', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'shops', key: 'id' }
		},
		procedure_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'procedures', key: 'id' }
		},
		revision_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'procedure_revisions', key: 'id' }
		},
		// The token itself, not a hash: every reprint of a sheet must carry the same link (see
		// models/booth-link.ts).
		token: { type: DataTypes.STRING(40), allowNull: false },
		issued_at: { type: DataTypes.DATE, allowNull: false },
		issued_by_id: user(),
		revoked_at: { type: DataTypes.DATE, allowNull: true },
		revoked_by_id: user(),
		...stamps
	});
	await q.addIndex('booth_links', ['token'], { unique: true });
	await q.addIndex('booth_links', ['shop_id', 'revision_id']);
	await q.addIndex('booth_links', ['shop_id', 'procedure_id']);

	// One row a lookup. Not the audit trail: a posted sheet is scanned all day, and the trail
	// should stay readable. Unknown tokens are logged too (shop and link empty).
	await q.createTable('booth_lookups', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: {
			type: DataTypes.INTEGER,
			allowNull: true,
			references: { model: 'shops', key: 'id' }
		},
		link_id: {
			type: DataTypes.INTEGER,
			allowNull: true,
			references: { model: 'booth_links', key: 'id' }
		},
		outcome: { type: DataTypes.STRING(12), allowNull: false },
		user_id: user(),
		ip: { type: DataTypes.STRING(64), allowNull: true },
		user_agent: { type: DataTypes.STRING(300), allowNull: true },
		at: { type: DataTypes.DATE, allowNull: false }
	});
	await q.addIndex('booth_lookups', ['shop_id', 'at']);
	await q.addIndex('booth_lookups', ['link_id', 'at']);
}

export async function down({ context: q }: { context: QueryInterface }) {
	await q.dropTable('booth_lookups');
	await q.dropTable('booth_links');
}
