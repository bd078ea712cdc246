import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

/** A person who welds for the shop; signing in is optional (`userId` links an account). */
export class Welder extends Model<InferAttributes<Welder>, InferCreationAttributes<Welder>> {
	declare id: CreationOptional<number>;
	declare shopId: ForeignKey<number>;
	declare name: string;
	/** The shop's welder ID or stamp; unique in the shop. */
	declare stamp: string;
	declare userId: CreationOptional<string | null>;
	/** For lapse notices when the welder has no account (the account's e-mail wins otherwise). */
	declare email: CreationOptional<string | null>;
	declare active: CreationOptional<boolean>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

Welder.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		name: { type: DataTypes.STRING(120), allowNull: false },
		stamp: { type: DataTypes.STRING(20), allowNull: false },
		userId: { type: DataTypes.UUID, allowNull: true },
		email: { type: DataTypes.STRING(254), allowNull: true },
		active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'welders' }
);
