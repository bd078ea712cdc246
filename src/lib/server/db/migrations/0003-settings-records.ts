import { DataTypes, type QueryInterface } from 'sequelize';
import { realType } from '../dialect';

// Settings records in SI (mm, A, V, mm/s, L/min, °C) and their photos. Every index leads with
// shop_id: every query of the list is scoped to one shop, then filtered or sorted.
export async function up({ context: q }: { context: QueryInterface }) {
	const real = () => ({ type: realType(q), allowNull: true });
	const str = (n: number) => ({ type: DataTypes.STRING(n), allowNull: true });
	await q.createTable('settings_records', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'shops', key: 'id' }
		},
		author_id: {
			type: DataTypes.UUID,
			allowNull: false,
			references: { model: 'users', key: 'id' }
		},
		process: { type: DataTypes.STRING(8), allowNull: false },
		current_type: str(8),
		transfer: str(16),
		amps: real(),
		volts: real(),
		wire_feed_mm_per_s: real(),
		travel_speed_mm_per_s: real(),
		filler_class: str(40),
		filler_diameter_mm: real(),
		tungsten_class: str(20),
		tungsten_diameter_mm: real(),
		gas_name: str(60),
		gas_flow_l_per_min: real(),
		base_metal_spec: str(60),
		base_metal_family: str(16),
		p_number: str(8),
		thickness_mm: real(),
		joint_type: str(16),
		position: str(4),
		preheat_c: real(),
		interpass_c: real(),
		machine: str(80),
		job_ref: str(80),
		outcome: str(60),
		outcome_kind: str(12),
		defects: { type: DataTypes.TEXT, allowNull: true },
		notes: { type: DataTypes.TEXT, allowNull: true },
		welded_on: { type: DataTypes.DATEONLY, allowNull: false },
		entered: { type: DataTypes.TEXT, allowNull: false, defaultValue: '{}' },
		findings: { type: DataTypes.TEXT, allowNull: false, defaultValue: '[]' },
		derived: { type: DataTypes.TEXT, allowNull: false, defaultValue: '{}' },
		caution_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
		search_text: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
		// Set by procedures (issue #5) when one cites the record: from then on it is frozen.
		frozen_at: { type: DataTypes.DATE, allowNull: true },
		cited_by_procedure_id: { type: DataTypes.INTEGER, allowNull: true },
		created_at: { type: DataTypes.DATE, allowNull: false },
		updated_at: { type: DataTypes.DATE, allowNull: false }
	});
	const ix = (fields: string[]) => q.addIndex('settings_records', ['shop_id', ...fields]);
	await ix(['welded_on', 'id']);
	await ix(['created_at']);
	await ix(['process', 'thickness_mm']);
	await ix(['thickness_mm']);
	await ix(['amps']);
	await ix(['base_metal_family', 'thickness_mm']);
	await ix(['filler_class']);
	await ix(['position']);
	await ix(['outcome_kind', 'welded_on']);
	await ix(['author_id', 'welded_on']);

	await q.createTable('settings_photos', {
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shop_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'shops', key: 'id' }
		},
		record_id: {
			type: DataTypes.INTEGER,
			allowNull: false,
			references: { model: 'settings_records', key: 'id' }
		},
		storage_key: { type: DataTypes.STRING(80), allowNull: false, unique: true },
		thumb_key: { type: DataTypes.STRING(80), allowNull: false },
		mime: { type: DataTypes.STRING(40), allowNull: false },
		original_name: { type: DataTypes.STRING(200), allowNull: false },
		bytes: { type: DataTypes.INTEGER, allowNull: false },
		width: { type: DataTypes.INTEGER, allowNull: false },
		height: { type: DataTypes.INTEGER, allowNull: false },
		uploaded_by_id: {
			type: DataTypes.UUID,
			allowNull: false,
			references: { model: 'users', key: 'id' }
		},
		removed_at: { type: DataTypes.DATE, allowNull: true },
		created_at: { type: DataTypes.DATE, allowNull: false },
		updated_at: { type: DataTypes.DATE, allowNull: false }
	});
	await q.addIndex('settings_photos', ['shop_id', 'record_id']);
}

export async function down({ context: q }: { context: QueryInterface }) {
	await q.dropTable('settings_photos');
	await q.dropTable('settings_records');
}
