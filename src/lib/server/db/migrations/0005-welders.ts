import { DataTypes, type QueryInterface } from 'sequelize';
import { realType } from '../dialect';

// Welders, their qualifications (WPQ), the continuity log, ISO 9606-1 confirmations, the lapse
// notices already sent and the card verification links. Status is never stored: it is computed
// from the test date and the log each time it is shown.
export async function up({ context: q }: { context: QueryInterface }) {
	const shop = () => ({
		type: DataTypes.INTEGER,
		allowNull: false,
		references: { model: 'shops', key: 'id' }
	});
	const user = (allowNull: boolean) => ({
		type: DataTypes.UUID,
		allowNull,
		references: { model: 'users', key: 'id' }
	});
	const stamps = {
		created_at: { type: DataTypes.DATE, allowNull: false },
		updated_at: { type: DataTypes.DATE, allowNull: false }
	};
	const str = (n: number, allowNull = true) => ({ type: DataTypes.STRING(n), allowNull });

	await q.createTable('welders', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: shop(),
		name: str(120, false),
		stamp: str(20, false),
		user_id: user(true),
		email: str(254),
		active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
		...stamps
	});
	await q.addIndex('welders', ['shop_id', 'stamp'], { unique: true });
	// One welder per account; NULLs (welders who never sign in) do not collide in SQLite.
	await q.addIndex('welders', ['user_id'], { unique: true });
	await q.addIndex('welders', ['shop_id', 'name']);

	const welder = () => ({
		type: DataTypes.INTEGER,
		allowNull: false,
		references: { model: 'welders', key: 'id' }
	});
	await q.createTable('qualifications', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: shop(),
		welder_id: welder(),
		process: str(8, false),
		code: str(16, false),
		test_date: { type: DataTypes.DATEONLY, allowNull: false },
		wps_ref: str(60),
		test_positions: str(40, false),
		coupon_type: str(8, false),
		coupon_diameter_mm: { type: realType(q), allowNull: true },
		coupon_thickness_mm: { type: realType(q), allowNull: false },
		deposit_thickness_mm: { type: realType(q), allowNull: false },
		deposit_layers: { type: DataTypes.INTEGER, allowNull: true },
		length_unit: str(4, false),
		f_number: { type: DataTypes.INTEGER, allowNull: true },
		filler_class: str(40),
		backing: str(12),
		current_type: str(8),
		results: { type: DataTypes.TEXT, allowNull: true },
		witnessed_by: str(120),
		record_key: str(80),
		record_name: str(200),
		withdrawn_at: { type: DataTypes.DATE, allowNull: true },
		created_by_id: user(false),
		...stamps
	});
	await q.addIndex('qualifications', ['shop_id', 'welder_id']);
	await q.addIndex('qualifications', ['shop_id', 'process']);

	await q.createTable('continuity_entries', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: shop(),
		welder_id: welder(),
		process: str(8, false),
		used_on: { type: DataTypes.DATEONLY, allowNull: false },
		source: str(8, false),
		note: str(500),
		recorded_by_id: user(true),
		recorded_by_name: str(120, false),
		...stamps
	});
	// Once per welder, process and day: a second tap the same day is ignored, not an error.
	await q.addIndex('continuity_entries', ['welder_id', 'process', 'used_on'], { unique: true });
	await q.addIndex('continuity_entries', ['shop_id', 'welder_id', 'used_on']);

	const qualification = () => ({
		type: DataTypes.INTEGER,
		allowNull: false,
		references: { model: 'qualifications', key: 'id' }
	});
	await q.createTable('qualification_confirmations', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: shop(),
		qualification_id: qualification(),
		confirmed_on: { type: DataTypes.DATEONLY, allowNull: false },
		responsible_person: str(120, false),
		note: str(500),
		recorded_by_id: user(false),
		...stamps
	});
	await q.addIndex('qualification_confirmations', ['shop_id', 'qualification_id']);

	await q.createTable('lapse_notices', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: shop(),
		qualification_id: qualification(),
		lapses_on: { type: DataTypes.DATEONLY, allowNull: false },
		kind: str(8, false),
		recipients: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
		sent_at: { type: DataTypes.DATE, allowNull: true },
		...stamps
	});
	// A notice is claimed by inserting this row, so a restart or a second run never sends twice.
	await q.addIndex('lapse_notices', ['qualification_id', 'lapses_on', 'kind'], { unique: true });

	await q.createTable('verification_links', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: shop(),
		welder_id: welder(),
		token: str(40, false),
		created_by_id: user(false),
		revoked_at: { type: DataTypes.DATE, allowNull: true },
		revoked_by_id: user(true),
		...stamps
	});
	await q.addIndex('verification_links', ['token'], { unique: true });
	await q.addIndex('verification_links', ['shop_id', 'welder_id']);
}

export async function down({ context: q }: { context: QueryInterface }) {
	for (const t of [
		'verification_links',
		'lapse_notices',
		'qualification_confirmations',
		'continuity_entries',
		'qualifications',
		'welders'
	])
		await q.dropTable(t);
}
