import { DataTypes, type QueryInterface } from 'sequelize';

// Shared state (issue #12): what one process used to keep in memory moves into the database, so
// that any number of processes on one database agree. Only queryInterface calls: the same
// migration runs on SQLite and on PostgreSQL.
export async function up({ context: q }: { context: QueryInterface }) {
	// Counters over a time window: failed sign-ins per e-mail, the rate limiters' hits per
	// address. Times are epoch milliseconds (BIGINT), so a window's end compares as a number on
	// every dialect, whatever each one does with dates.
	await q.createTable('window_counters', {
		key: { type: DataTypes.STRING(320), primaryKey: true, allowNull: false },
		hits: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
		window_end: { type: DataTypes.BIGINT, allowNull: false }
	});
	await q.addIndex('window_counters', ['window_end']);

	// One row a scheduled job: the process that holds it until `lease_until` runs the job.
	await q.createTable('job_leases', {
		name: { type: DataTypes.STRING(60), primaryKey: true, allowNull: false },
		holder: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
		lease_until: { type: DataTypes.BIGINT, allowNull: false, defaultValue: 0 },
		runs: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
		last_run_at: { type: DataTypes.DATE, allowNull: true }
	});

	// Booth lookups become one row per link (or, for unknown and limited lookups, per address)
	// and outcome per window, with the number of lookups in it; rows from before keep
	// `bucket` empty and count one lookup each (NULLs never collide in a unique index).
	await q.addColumn('booth_lookups', 'bucket', { type: DataTypes.STRING(120), allowNull: true });
	await q.addColumn('booth_lookups', 'window_start', { type: DataTypes.BIGINT, allowNull: true });
	await q.addColumn('booth_lookups', 'hits', {
		type: DataTypes.INTEGER,
		allowNull: false,
		defaultValue: 1
	});
	await q.addColumn('booth_lookups', 'last_at', { type: DataTypes.DATE, allowNull: true });
	await q.addIndex('booth_lookups', ['bucket', 'window_start'], { unique: true });
}

export async function down({ context: q }: { context: QueryInterface }) {
	await q.removeIndex('booth_lookups', ['bucket', 'window_start']);
	for (const c of ['last_at', 'hits', 'window_start', 'bucket'])
		await q.removeColumn('booth_lookups', c);
	await q.dropTable('job_leases');
	await q.dropTable('window_counters');
}
