import { DataTypes, type QueryInterface } from 'sequelize';
import { machineZone } from '../../../dates/time-zone';

// The shop's time zone (IANA name): continuity days ("welded today", lapse dates) and the times
// the audit trail shows are the shop's, not the server's, once one server hosts shops in several
// zones. Until now a shop's day was the server machine's (TZ): existing shops take that zone, so
// no continuity day moves on upgrade; their admin can then name the shop's own.
export async function up({ context: q }: { context: QueryInterface }) {
	await q.addColumn('shops', 'time_zone', {
		type: DataTypes.STRING(64),
		allowNull: false,
		defaultValue: 'UTC'
	});
	const machine = machineZone();
	if (machine !== 'UTC') await q.bulkUpdate('shops', { time_zone: machine }, {});
}

export async function down({ context: q }: { context: QueryInterface }) {
	await q.removeColumn('shops', 'time_zone');
}
