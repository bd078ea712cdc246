import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

/** ISO 9606-1: the employer's responsible person confirms the qualification every six months. */
export class QualificationConfirmation extends Model<
	InferAttributes<QualificationConfirmation>,
	InferCreationAttributes<QualificationConfirmation>
> {
	declare id: CreationOptional<number>;
	declare shopId: ForeignKey<number>;
	declare qualificationId: ForeignKey<number>;
	declare confirmedOn: string;
	declare responsiblePerson: string;
	declare note: string | null;
	declare recordedById: ForeignKey<string>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

QualificationConfirmation.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		qualificationId: { type: DataTypes.INTEGER, allowNull: false },
		confirmedOn: { type: DataTypes.DATEONLY, allowNull: false },
		responsiblePerson: { type: DataTypes.STRING(120), allowNull: false },
		note: { type: DataTypes.STRING(500), allowNull: true },
		recordedById: { type: DataTypes.UUID, allowNull: false },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'qualification_confirmations' }
);
