import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

/** A photo of a settings record: the re-encoded image and its thumbnail in storage. */
export class SettingsPhoto extends Model<
	InferAttributes<SettingsPhoto>,
	InferCreationAttributes<SettingsPhoto>
> {
	declare id: CreationOptional<number>;
	declare shopId: ForeignKey<number>;
	declare recordId: ForeignKey<number>;
	/** Random storage names (never the uploaded name). */
	declare storageKey: string;
	declare thumbKey: string;
	declare mime: string;
	/** Shown to people only; never used as a path. */
	declare originalName: string;
	declare bytes: number;
	declare width: number;
	declare height: number;
	declare uploadedById: ForeignKey<string>;
	/** Removed from the record; the file is kept so the audit trail's reference stays true. */
	declare removedAt: CreationOptional<Date | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

SettingsPhoto.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		recordId: { type: DataTypes.INTEGER, allowNull: false },
		storageKey: { type: DataTypes.STRING(80), allowNull: false, unique: true },
		thumbKey: { type: DataTypes.STRING(80), allowNull: false },
		mime: { type: DataTypes.STRING(40), allowNull: false },
		originalName: { type: DataTypes.STRING(200), allowNull: false },
		bytes: { type: DataTypes.INTEGER, allowNull: false },
		width: { type: DataTypes.INTEGER, allowNull: false },
		height: { type: DataTypes.INTEGER, allowNull: false },
		uploadedById: { type: DataTypes.UUID, allowNull: false },
		removedAt: { type: DataTypes.DATE, allowNull: true },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'settings_photos' }
);
