import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import type { Process } from '$lib/weld';
import { sequelize } from '../db/sequelize';

export type QualificationCode = 'ASME IX' | 'AWS D1.1' | 'ISO 9606-1';

/**
 * One welder performance qualification (WPQ) as tested. Lengths in mm with the unit they were
 * entered in, so the ranges are computed with the code's own values for that system.
 */
export class Qualification extends Model<
	InferAttributes<Qualification>,
	InferCreationAttributes<Qualification>
> {
	declare id: CreationOptional<number>;
	declare shopId: ForeignKey<number>;
	declare welderId: ForeignKey<number>;
	declare process: Process;
	declare code: QualificationCode;
	declare testDate: string;
	declare wpsRef: string | null;
	/** Comma-separated test positions, e.g. "3G" or "3G,4G". */
	declare testPositions: string;
	declare couponType: 'plate' | 'pipe';
	declare couponDiameterMm: number | null;
	declare couponThicknessMm: number;
	declare depositThicknessMm: number;
	declare depositLayers: number | null;
	declare lengthUnit: 'in' | 'mm';
	declare fNumber: number | null;
	declare fillerClass: string | null;
	declare backing: 'with' | 'without' | null;
	declare currentType: string | null;
	declare results: string | null;
	declare witnessedBy: string | null;
	/** The uploaded test record (PDF) in storage, and its name as sent. */
	declare recordKey: CreationOptional<string | null>;
	declare recordName: CreationOptional<string | null>;
	declare withdrawnAt: CreationOptional<Date | null>;
	declare createdById: ForeignKey<string>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

const str = (n: number) => ({ type: DataTypes.STRING(n), allowNull: true });

Qualification.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		welderId: { type: DataTypes.INTEGER, allowNull: false },
		process: { type: DataTypes.STRING(8), allowNull: false },
		code: { type: DataTypes.STRING(16), allowNull: false },
		testDate: { type: DataTypes.DATEONLY, allowNull: false },
		wpsRef: str(60),
		testPositions: { type: DataTypes.STRING(40), allowNull: false },
		couponType: { type: DataTypes.STRING(8), allowNull: false },
		couponDiameterMm: { type: DataTypes.REAL, allowNull: true },
		couponThicknessMm: { type: DataTypes.REAL, allowNull: false },
		depositThicknessMm: { type: DataTypes.REAL, allowNull: false },
		depositLayers: { type: DataTypes.INTEGER, allowNull: true },
		lengthUnit: { type: DataTypes.STRING(4), allowNull: false },
		fNumber: { type: DataTypes.INTEGER, allowNull: true },
		fillerClass: str(40),
		backing: str(12),
		currentType: str(8),
		results: { type: DataTypes.TEXT, allowNull: true },
		witnessedBy: str(120),
		recordKey: str(80),
		recordName: str(200),
		withdrawnAt: { type: DataTypes.DATE, allowNull: true },
		createdById: { type: DataTypes.UUID, allowNull: false },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'qualifications' }
);
