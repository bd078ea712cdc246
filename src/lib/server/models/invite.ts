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

export class Invite extends Model<InferAttributes<Invite>, InferCreationAttributes<Invite>> {
	declare id: CreationOptional<number>;
	declare shopId: ForeignKey<number>;
	declare email: string;
	declare name: string;
	declare role: Role;
	/** SHA-256 of the token in the link; the token itself is only ever in the e-mail. */
	declare tokenHash: string;
	declare expiresAt: Date;
	declare usedAt: CreationOptional<Date | null>;
	declare invitedById: ForeignKey<string>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

Invite.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		email: { type: DataTypes.STRING(254), allowNull: false },
		name: { type: DataTypes.STRING(120), allowNull: false },
		role: { type: DataTypes.STRING(20), allowNull: false },
		tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
		expiresAt: { type: DataTypes.DATE, allowNull: false },
		usedAt: { type: DataTypes.DATE, allowNull: true },
		invitedById: { type: DataTypes.UUID, allowNull: false },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'invites' }
);
