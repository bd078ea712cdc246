import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

/**
 * The link a qualification card's QR code carries (/q/<token>). The token is stored as it is,
 * not hashed: every reprint of the card needs it again, and it opens only what anyone holding
 * the card may read (name, stamp, processes and whether each is current).
 */
export class VerificationLink extends Model<
	InferAttributes<VerificationLink>,
	InferCreationAttributes<VerificationLink>
> {
	declare id: CreationOptional<number>;
	declare shopId: ForeignKey<number>;
	declare welderId: ForeignKey<number>;
	declare token: string;
	declare createdById: ForeignKey<string>;
	declare revokedAt: CreationOptional<Date | null>;
	declare revokedById: CreationOptional<string | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

VerificationLink.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		welderId: { type: DataTypes.INTEGER, allowNull: false },
		token: { type: DataTypes.STRING(40), allowNull: false, unique: true },
		createdById: { type: DataTypes.UUID, allowNull: false },
		revokedAt: { type: DataTypes.DATE, allowNull: true },
		revokedById: { type: DataTypes.UUID, allowNull: true },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'verification_links' }
);
