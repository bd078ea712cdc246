import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

export type UnitSystem = 'imperial' | 'metric';

export class Shop extends Model<InferAttributes<Shop>, InferCreationAttributes<Shop>> {
	declare id: CreationOptional<number>;
	declare name: string;
	declare unitSystem: CreationOptional<UnitSystem>;
	/** Governing code new procedures, PQRs and WPQs start from (migration 0011). */
	declare defaultCode: CreationOptional<string>;
	/** IANA zone of the shop's day and clock (migration 0015). */
	declare timeZone: CreationOptional<string>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

Shop.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		name: { type: DataTypes.STRING(120), allowNull: false },
		unitSystem: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'imperial' },
		defaultCode: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'asme-ix' },
		timeZone: { type: DataTypes.STRING(64), allowNull: false, defaultValue: 'UTC' },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'shops' }
);
