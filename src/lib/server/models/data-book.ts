import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

/**
 * A data book as it was handed to the customer: the exact manifest.json in its ZIP, that text's
 * SHA-256 and the random token its cover's QR code carries. Append-only (migration 0012): a new
 * compile is a new row, an old one is never changed.
 */
export class DataBook extends Model<InferAttributes<DataBook>, InferCreationAttributes<DataBook>> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare jobId: number;
	declare token: string;
	declare manifest: string;
	declare manifestDigest: string;
	declare madeById: string;
	declare madeAt: Date;
}

DataBook.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		jobId: { type: DataTypes.INTEGER, allowNull: false },
		token: { type: DataTypes.STRING(64), allowNull: false },
		manifest: { type: DataTypes.TEXT, allowNull: false },
		manifestDigest: { type: DataTypes.STRING(64), allowNull: false },
		madeById: { type: DataTypes.UUID, allowNull: false },
		madeAt: { type: DataTypes.DATE, allowNull: false }
	},
	{ sequelize, tableName: 'data_books', timestamps: false }
);
