import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

/** Hits on one key until `windowEnd` (epoch ms); see db/window-counters.ts. */
export class WindowCounter extends Model<
	InferAttributes<WindowCounter>,
	InferCreationAttributes<WindowCounter>
> {
	declare key: string;
	declare hits: number;
	declare windowEnd: number;
}

// BIGINT comes back from pg as a string (it may not fit a JS number); ours are epoch ms, which do.
const epochMs = (name: string) => ({
	type: DataTypes.BIGINT,
	allowNull: false,
	get(this: Model) {
		return Number(this.getDataValue(name));
	}
});

WindowCounter.init(
	{
		key: { type: DataTypes.STRING(320), primaryKey: true },
		hits: { type: DataTypes.INTEGER, allowNull: false },
		windowEnd: epochMs('windowEnd')
	},
	{ sequelize, tableName: 'window_counters', timestamps: false }
);

/** Who runs a scheduled job until when; see jobs/lease.ts. */
export class JobLease extends Model<InferAttributes<JobLease>, InferCreationAttributes<JobLease>> {
	declare name: string;
	declare holder: string;
	declare leaseUntil: number;
	declare runs: CreationOptional<number>;
	declare lastRunAt: CreationOptional<Date | null>;
}

JobLease.init(
	{
		name: { type: DataTypes.STRING(60), primaryKey: true },
		holder: { type: DataTypes.STRING(120), allowNull: false },
		leaseUntil: epochMs('leaseUntil'),
		runs: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
		lastRunAt: { type: DataTypes.DATE, allowNull: true }
	},
	{ sequelize, tableName: 'job_leases', timestamps: false }
);
