import { DataTypes, type QueryInterface } from 'sequelize';
import { appendOnly } from '../dialect';

// Procedures (WPS) with revisions, PQRs with lab reports and addenda, and sign-offs. A revision's
// variables are one JSON document; the columns beside it are what the lists filter on. Every
// index leads with shop_id. Sign-offs and addenda are append-only, like the audit trail.
export async function up({ context: q }: { context: QueryInterface }) {
	const id = () => ({ type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true });
	const ref = (model: string, allowNull = false) => ({
		type: DataTypes.INTEGER,
		allowNull,
		references: { model, key: 'id' }
	});
	const user = (allowNull = false) => ({
		type: DataTypes.UUID,
		allowNull,
		references: { model: 'users', key: 'id' }
	});
	const str = (n: number, allowNull = true) => ({ type: DataTypes.STRING(n), allowNull });
	const date = (allowNull = true) => ({ type: DataTypes.DATE, allowNull });
	const stamps = () => ({ created_at: date(false), updated_at: date(false) });

	await q.createTable('procedure_numbering', {
		shop_id: { ...ref('shops'), primaryKey: true },
		wps_pattern: str(40, false),
		pqr_pattern: str(40, false),
		...stamps()
	});

	await q.createTable('procedures', {
		id: id(),
		shop_id: ref('shops'),
		number: str(40, false),
		// The head revision's title, code, process, material and state, for the list.
		title: str(120, false),
		code: str(16, false),
		process: str(8, false),
		base_metal_family: str(16),
		state: str(12, false),
		head_rev: { type: DataTypes.INTEGER, allowNull: false },
		approved_rev: { type: DataTypes.INTEGER, allowNull: true },
		search_text: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
		created_by_id: user(),
		...stamps()
	});
	await q.addIndex('procedures', ['shop_id', 'number'], { unique: true });
	for (const col of ['state', 'process', 'code', 'base_metal_family', 'updated_at'])
		await q.addIndex('procedures', ['shop_id', col]);

	await q.createTable('procedure_revisions', {
		id: id(),
		shop_id: ref('shops'),
		procedure_id: ref('procedures'),
		rev: { type: DataTypes.INTEGER, allowNull: false },
		state: str(12, false),
		variables: { type: DataTypes.TEXT, allowNull: false },
		process: str(8, false),
		code: str(16, false),
		base_metal_family: str(16),
		author_id: user(),
		submitted_by_id: user(true),
		submitted_at: date(),
		decided_at: date(),
		return_comment: { type: DataTypes.TEXT, allowNull: true },
		superseded_at: date(),
		superseded_by_rev: { type: DataTypes.INTEGER, allowNull: true },
		withdrawn_at: date(),
		withdrawn_by_id: user(true),
		withdraw_reason: { type: DataTypes.TEXT, allowNull: true },
		...stamps()
	});
	await q.addIndex('procedure_revisions', ['procedure_id', 'rev'], { unique: true });
	await q.addIndex('procedure_revisions', ['shop_id', 'state', 'submitted_at']);

	await q.createTable('pqrs', {
		id: id(),
		shop_id: ref('shops'),
		number: str(40, false),
		title: str(120, false),
		process: str(8, false),
		state: str(12, false),
		actual_values: { type: DataTypes.TEXT, allowNull: false },
		tests: { type: DataTypes.TEXT, allowNull: false },
		qualified: { type: DataTypes.TEXT, allowNull: false },
		author_id: user(),
		certified_by_id: user(true),
		certified_name: str(120),
		certified_at: date(),
		certified_digest: str(64),
		...stamps()
	});
	await q.addIndex('pqrs', ['shop_id', 'number'], { unique: true });
	await q.addIndex('pqrs', ['shop_id', 'process']);
	await q.addIndex('pqrs', ['shop_id', 'state']);

	await q.createTable('pqr_reports', {
		id: id(),
		shop_id: ref('shops'),
		pqr_id: ref('pqrs'),
		storage_key: { type: DataTypes.STRING(80), allowNull: false, unique: true },
		original_name: str(200, false),
		bytes: { type: DataTypes.INTEGER, allowNull: false },
		sha256: str(64, false),
		uploaded_by_id: user(),
		removed_at: date(),
		...stamps()
	});
	await q.addIndex('pqr_reports', ['shop_id', 'pqr_id']);

	await q.createTable('pqr_addenda', {
		id: id(),
		shop_id: ref('shops'),
		pqr_id: ref('pqrs'),
		author_id: user(),
		author_name: str(120, false),
		body: { type: DataTypes.TEXT, allowNull: false },
		created_at: date(false)
	});
	await q.addIndex('pqr_addenda', ['shop_id', 'pqr_id']);

	const link = async (table: string, other: string, column: string) => {
		await q.createTable(table, {
			id: id(),
			shop_id: ref('shops'),
			revision_id: ref('procedure_revisions'),
			[column]: ref(other)
		});
		await q.addIndex(table, ['revision_id', column], { unique: true });
		await q.addIndex(table, ['shop_id', column]);
	};
	await link('procedure_revision_pqrs', 'pqrs', 'pqr_id');
	await link('procedure_revision_records', 'settings_records', 'record_id');

	await q.createTable('sign_offs', {
		id: id(),
		shop_id: ref('shops'),
		revision_id: ref('procedure_revisions'),
		user_id: user(),
		printed_name: str(120, false),
		role: str(20, false),
		meaning: str(12, false),
		comment: { type: DataTypes.TEXT, allowNull: true },
		signed_at: date(false),
		// SHA-256 of the canonical JSON reviewed, that JSON itself, and a seal over both and the
		// signer's manifestation, so the row cannot be moved to another revision unnoticed.
		digest: str(64, false),
		canonical: { type: DataTypes.TEXT, allowNull: false },
		seal: str(64, false)
	});
	await q.addIndex('sign_offs', ['shop_id', 'revision_id']);

	for (const table of ['sign_offs', 'pqr_addenda'])
		await appendOnly(q, table, `${table} are append-only`, '\n\t\t\t');
}

export async function down({ context: q }: { context: QueryInterface }) {
	for (const table of [
		'sign_offs',
		'procedure_revision_records',
		'procedure_revision_pqrs',
		'pqr_addenda',
		'pqr_reports',
		'pqrs',
		'procedure_revisions',
		'procedures',
		'procedure_numbering'
	])
		await q.dropTable(table);
}
