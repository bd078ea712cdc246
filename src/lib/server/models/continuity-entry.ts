import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import type { Process } from '$lib/weld';
import { sequelize } from '../db/sequelize';

export type ContinuitySource = 'booth' | 'manual';

/** One dated use of a process by a welder; at most one per welder, process and day. */
export class ContinuityEntry extends Model<
	InferAttributes<ContinuityEntry>,
	InferCreationAttributes<ContinuityEntry>
> {
	declare id: CreationOptional<number>;
	declare shopId: ForeignKey<number>;
	declare welderId: ForeignKey<number>;
	declare process: Process;
	declare usedOn: string;
	declare source: ContinuitySource;
	declare note: string | null;
	declare recordedById: string | null;
	/** The recorder's name at the time, so the log reads right after a rename. */
	declare recordedByName: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

ContinuityEntry.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		welderId: { type: DataTypes.INTEGER, allowNull: false },
		process: { type: DataTypes.STRING(8), allowNull: false },
		usedOn: { type: DataTypes.DATEONLY, allowNull: false },
		source: { type: DataTypes.STRING(8), allowNull: false },
		note: { type: DataTypes.STRING(500), allowNull: true },
		recordedById: { type: DataTypes.UUID, allowNull: true },
		recordedByName: { type: DataTypes.STRING(120), allowNull: false },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'continuity_entries' }
);
