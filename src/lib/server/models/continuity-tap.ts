import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

export type TapOutcome = 'logged' | 'already' | 'refused';

/**
 * A continuity tap as the server received it, keyed by the id the phone made (unique per person):
 * a retried tap finds its row and gets the same answer, and nothing counts twice. `madeAt` is
 * the phone's time of the tap, `receivedAt` the server's time of arrival.
 */
export class ContinuityTap extends Model<
	InferAttributes<ContinuityTap>,
	InferCreationAttributes<ContinuityTap>
> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare userId: string;
	declare clientId: string;
	declare linkId: number | null;
	declare continuityEntryId: number | null;
	declare outcome: TapOutcome;
	declare message: string | null;
	declare madeAt: Date;
	declare receivedAt: Date;
}

ContinuityTap.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		userId: { type: DataTypes.UUID, allowNull: false },
		clientId: { type: DataTypes.STRING(64), allowNull: false },
		linkId: { type: DataTypes.INTEGER, allowNull: true },
		continuityEntryId: { type: DataTypes.INTEGER, allowNull: true },
		outcome: { type: DataTypes.STRING(12), allowNull: false },
		message: { type: DataTypes.STRING(300), allowNull: true },
		madeAt: { type: DataTypes.DATE, allowNull: false },
		receivedAt: { type: DataTypes.DATE, allowNull: false }
	},
	{ sequelize, tableName: 'continuity_taps', timestamps: false }
);
