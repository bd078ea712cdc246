import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import type { Role } from '$lib/roles';
import { sequelize } from '../db/sequelize';
import type { UnitSystem } from './shop';

// Also the Auth.js adapter's User: it reads id, name, email, emailVerified and image.
export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
	declare id: CreationOptional<string>;
	declare shopId: ForeignKey<number>;
	declare name: string;
	declare email: string;
	declare emailVerified: Date | null;
	declare image: CreationOptional<string | null>;
	declare role: Role;
	declare active: CreationOptional<boolean>;
	/** Bumped by "sign out everywhere" and by disabling: tokens carrying an older number are dead. */
	declare sessionVersion: CreationOptional<number>;
	declare passwordHash: string | null;
	declare unitSystem: CreationOptional<UnitSystem | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

User.init(
	{
		id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		name: { type: DataTypes.STRING(120), allowNull: false },
		email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
		emailVerified: { type: DataTypes.DATE, allowNull: true },
		image: { type: DataTypes.STRING, allowNull: true },
		role: { type: DataTypes.STRING(20), allowNull: false },
		active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
		sessionVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
		passwordHash: { type: DataTypes.STRING(100), allowNull: true },
		unitSystem: { type: DataTypes.STRING(10), allowNull: true },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'users' }
);
