import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

export type LapseNoticeKind = '30-day' | '7-day' | 'day';

/**
 * A lapse warning claimed or sent for one qualification and one lapse date. A new lapse date
 * (a use was logged) starts a fresh set of notices.
 */
export class LapseNotice extends Model<
	InferAttributes<LapseNotice>,
	InferCreationAttributes<LapseNotice>
> {
	declare id: CreationOptional<number>;
	declare shopId: ForeignKey<number>;
	declare qualificationId: ForeignKey<number>;
	declare lapsesOn: string;
	declare kind: LapseNoticeKind;
	declare recipients: CreationOptional<string>;
	/** Null while claimed and being sent. */
	declare sentAt: CreationOptional<Date | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

LapseNotice.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		qualificationId: { type: DataTypes.INTEGER, allowNull: false },
		lapsesOn: { type: DataTypes.DATEONLY, allowNull: false },
		kind: { type: DataTypes.STRING(8), allowNull: false },
		recipients: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
		sentAt: { type: DataTypes.DATE, allowNull: true },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'lapse_notices' }
);
