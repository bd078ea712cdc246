import { DataTypes, type QueryInterface } from 'sequelize';

// The governing code (issue 15): the shop's default for new procedures, PQRs and WPQs, and the
// code each PQR follows. Revisions and WPQs already carry theirs (0004, 0005). Plain
// queryInterface calls: the same on SQLite and PostgreSQL. Existing rows are ASME IX, which is
// what Beadline judged them by until now.
export async function up({ context: q }: { context: QueryInterface }) {
	await q.addColumn('shops', 'default_code', {
		type: DataTypes.STRING(16),
		allowNull: false,
		defaultValue: 'asme-ix'
	});
	await q.addColumn('pqrs', 'code', {
		type: DataTypes.STRING(16),
		allowNull: false,
		defaultValue: 'asme-ix'
	});
}

export async function down({ context: q }: { context: QueryInterface }) {
	await q.removeColumn('pqrs', 'code');
	await q.removeColumn('shops', 'default_code');
}
