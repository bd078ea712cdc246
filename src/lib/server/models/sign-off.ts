import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

export type SignOffMeaning = 'approved' | 'returned';

/**
 * An inspector's decision on a revision, as an electronic signature: who (id, and printed name and
 * role at that moment), what it means, when (server UTC), the comment, and the SHA-256 of the
 * canonical content reviewed. `seal` binds all of these to the revision. Append-only.
 */
export class SignOff extends Model<InferAttributes<SignOff>, InferCreationAttributes<SignOff>> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare revisionId: number;
	declare userId: string;
	declare printedName: string;
	declare role: string;
	declare meaning: SignOffMeaning;
	declare comment: string | null;
	declare signedAt: Date;
	declare digest: string;
	declare canonical: string;
	declare seal: string;
}

SignOff.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		revisionId: { type: DataTypes.INTEGER, allowNull: false },
		userId: { type: DataTypes.UUID, allowNull: false },
		printedName: { type: DataTypes.STRING(120), allowNull: false },
		role: { type: DataTypes.STRING(20), allowNull: false },
		meaning: { type: DataTypes.STRING(12), allowNull: false },
		comment: { type: DataTypes.TEXT, allowNull: true },
		signedAt: { type: DataTypes.DATE, allowNull: false },
		digest: { type: DataTypes.STRING(64), allowNull: false },
		canonical: { type: DataTypes.TEXT, allowNull: false },
		seal: { type: DataTypes.STRING(64), allowNull: false }
	},
	{ sequelize, tableName: 'sign_offs', timestamps: false }
);
