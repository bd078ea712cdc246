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

export class ApiToken extends Model<InferAttributes<ApiToken>, InferCreationAttributes<ApiToken>> {
	declare id: CreationOptional<number>;
	declare shopId: ForeignKey<number>;
	declare name: string;
	/** The rights the token acts with; never admin. */
	declare role: Role;
	/** SHA-256 hex of the secret; the secret is shown once and never stored. */
	declare tokenHash: string;
	/** The first characters, so people can tell their tokens apart. */
	declare prefix: string;
	declare createdById: ForeignKey<string>;
	declare lastUsedAt: CreationOptional<Date | null>;
	declare revokedAt: CreationOptional<Date | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

ApiToken.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		name: { type: DataTypes.STRING(80), allowNull: false },
		role: { type: DataTypes.STRING(20), allowNull: false },
		tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
		prefix: { type: DataTypes.STRING(16), allowNull: false },
		createdById: { type: DataTypes.UUID, allowNull: false },
		lastUsedAt: { type: DataTypes.DATE, allowNull: true },
		revokedAt: { type: DataTypes.DATE, allowNull: true },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'api_tokens' }
);
