import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

// Append-only: triggers in the migration refuse UPDATE and DELETE on this table.
export class AuditEvent extends Model<
	InferAttributes<AuditEvent>,
	InferCreationAttributes<AuditEvent>
> {
	declare id: CreationOptional<number>;
	declare shopId: number | null;
	declare actorId: string | null;
	/** The actor's name at the time, so the trail reads right after a rename. */
	declare actorName: string;
	declare action: string;
	declare objectType: string;
	declare objectId: string | null;
	declare before: string | null;
	declare after: string | null;
	declare ip: string | null;
	declare userAgent: string | null;
	declare at: CreationOptional<Date>;
}

AuditEvent.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: true },
		actorId: { type: DataTypes.UUID, allowNull: true },
		actorName: { type: DataTypes.STRING(120), allowNull: false },
		action: { type: DataTypes.STRING(60), allowNull: false },
		objectType: { type: DataTypes.STRING(40), allowNull: false },
		objectId: { type: DataTypes.STRING(64), allowNull: true },
		before: { type: DataTypes.TEXT, allowNull: true },
		after: { type: DataTypes.TEXT, allowNull: true },
		ip: { type: DataTypes.STRING(64), allowNull: true },
		userAgent: { type: DataTypes.STRING(300), allowNull: true },
		at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW }
	},
	{ sequelize, tableName: 'audit_events', timestamps: false }
);
