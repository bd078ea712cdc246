import { DataTypes, type QueryInterface } from 'sequelize';
import { appendOnly } from '../dialect';

// Jobs and their joints, the weld log, inspectors' overrides, inspections, repairs and the data
// books handed to the customer (issue #17). Plain QueryInterface calls (the same on SQLite and
// PostgreSQL) plus the shared append-only triggers. What is signed or logged is never edited:
// weld logs, overrides, inspections, repairs and data books are append-only; a mistake is
// answered by a new row, never by changing an old one.
const INT = DataTypes.INTEGER;
const id = { type: INT, primaryKey: true, autoIncrement: true };
const ref = (model: string, allowNull = false) => ({
	type: INT,
	allowNull,
	references: { model, key: 'id' }
});
const user = (allowNull = false) => ({
	type: DataTypes.UUID,
	allowNull,
	references: { model: 'users', key: 'id' }
});
const text = (n: number, allowNull = false) => ({ type: DataTypes.STRING(n), allowNull });
const when = { type: DataTypes.DATE, allowNull: false };
// Who signed, as procedures' sign-offs keep it: the printed name and role at that moment, the
// SHA-256 of the canonical content and a seal binding both.
const signature = {
	signed_by_id: user(),
	printed_name: text(120),
	role: text(20),
	signed_at: when,
	digest: text(64),
	canonical: { type: DataTypes.TEXT, allowNull: false },
	seal: text(64)
};

export async function up({ context: q }: { context: QueryInterface }) {
	await q.createTable('jobs', {
		id,
		shop_id: ref('shops'),
		number: text(40),
		customer: text(120),
		part: text(120),
		drawing: text(60),
		drawing_rev: text(20),
		code: text(16),
		due_on: { type: DataTypes.DATEONLY, allowNull: true },
		created_by_id: user(),
		created_at: when,
		updated_at: when
	});
	await q.addConstraint('jobs', {
		type: 'unique',
		fields: ['shop_id', 'number'],
		name: 'jobs_shop_number_unique'
	});

	await q.createTable('job_joints', {
		id,
		shop_id: ref('shops'),
		job_id: ref('jobs'),
		mark: text(20),
		joint_type: text(12),
		size: text(40),
		base_metals: text(120),
		position: text(4),
		revision_id: ref('procedure_revisions'),
		created_at: when,
		updated_at: when
	});
	await q.addConstraint('job_joints', {
		type: 'unique',
		fields: ['job_id', 'mark'],
		name: 'job_joints_job_mark_unique'
	});
	await q.addIndex('job_joints', ['shop_id', 'revision_id']);

	// An inspector lets one welder log one joint despite a refusal, with a reason, signed.
	await q.createTable('weld_overrides', {
		id,
		shop_id: ref('shops'),
		joint_id: ref('job_joints'),
		welder_id: ref('welders'),
		refusal: text(500),
		reason: text(500),
		...signature
	});
	await q.addIndex('weld_overrides', ['joint_id', 'welder_id']);

	// One row a joint and pass: the unique constraint decides between parallel logs.
	await q.createTable('weld_logs', {
		id,
		shop_id: ref('shops'),
		joint_id: ref('job_joints'),
		welder_id: ref('welders'),
		pass: text(8),
		welded_on: { type: DataTypes.DATEONLY, allowNull: false },
		revision_id: ref('procedure_revisions'),
		// 0 for the joint's first weld, the repair's round (1, 2 …) for a repair's passes.
		round: { type: INT, allowNull: false, defaultValue: 0 },
		override_id: ref('weld_overrides', true),
		continuity_entry_id: ref('continuity_entries', true),
		recorded_by_id: user(),
		recorded_by_name: text(120),
		created_at: when
	});
	await q.addConstraint('weld_logs', {
		type: 'unique',
		fields: ['joint_id', 'round', 'pass'],
		name: 'weld_logs_joint_pass_unique'
	});
	await q.addIndex('weld_logs', ['shop_id', 'welder_id']);

	await q.createTable('joint_inspections', {
		id,
		shop_id: ref('shops'),
		joint_id: ref('job_joints'),
		method: text(2),
		extent: text(60),
		result: text(8),
		note: text(500, true),
		report_key: text(80, true),
		report_name: text(200, true),
		report_sha256: text(64, true),
		...signature
	});
	await q.addIndex('joint_inspections', ['joint_id']);

	await q.createTable('joint_repairs', {
		id,
		shop_id: ref('shops'),
		joint_id: ref('job_joints'),
		inspection_id: ref('joint_inspections'),
		round: { type: INT, allowNull: false },
		revision_id: ref('procedure_revisions'),
		welder_id: ref('welders'),
		note: text(500, true),
		recorded_by_id: user(),
		recorded_by_name: text(120),
		created_at: when
	});
	await q.addConstraint('joint_repairs', {
		type: 'unique',
		fields: ['joint_id', 'round'],
		name: 'joint_repairs_joint_round_unique'
	});

	await q.createTable('data_books', {
		id,
		shop_id: ref('shops'),
		job_id: ref('jobs'),
		token: text(64),
		manifest: { type: DataTypes.TEXT, allowNull: false },
		manifest_digest: text(64),
		made_by_id: user(),
		made_at: when
	});
	await q.addConstraint('data_books', {
		type: 'unique',
		fields: ['token'],
		name: 'data_books_token_unique'
	});

	for (const table of [
		'weld_overrides',
		'weld_logs',
		'joint_inspections',
		'joint_repairs',
		'data_books'
	])
		await appendOnly(q, table, `${table} are append-only`, '\n\t\t\t');
}

export async function down({ context: q }: { context: QueryInterface }) {
	for (const table of [
		'data_books',
		'joint_repairs',
		'joint_inspections',
		'weld_logs',
		'weld_overrides',
		'job_joints',
		'jobs'
	])
		await q.dropTable(table);
}
