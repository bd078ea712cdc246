import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';
import { SIGNED_COLUMNS, type Signed } from './weld-log';

export type InspectionMethod = 'VT' | 'PT' | 'MT' | 'RT' | 'UT';
export type InspectionResult = 'accept' | 'reject';

/** An examination of one joint by an inspector, signed. Append-only. */
export class JointInspection
	extends Model<InferAttributes<JointInspection>, InferCreationAttributes<JointInspection>>
	implements Signed
{
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare jointId: number;
	declare method: InspectionMethod;
	declare extent: string;
	declare result: InspectionResult;
	declare note: string | null;
	declare reportKey: string | null;
	declare reportName: string | null;
	declare reportSha256: string | null;
	declare signedById: string;
	declare printedName: string;
	declare role: string;
	declare signedAt: Date;
	declare digest: string;
	declare canonical: string;
	declare seal: string;
}

JointInspection.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		jointId: { type: DataTypes.INTEGER, allowNull: false },
		method: { type: DataTypes.STRING(2), allowNull: false },
		extent: { type: DataTypes.STRING(60), allowNull: false },
		result: { type: DataTypes.STRING(8), allowNull: false },
		note: { type: DataTypes.STRING(500), allowNull: true },
		reportKey: { type: DataTypes.STRING(80), allowNull: true },
		reportName: { type: DataTypes.STRING(200), allowNull: true },
		reportSha256: { type: DataTypes.STRING(64), allowNull: true },
		...SIGNED_COLUMNS
	},
	{ sequelize, tableName: 'joint_inspections', timestamps: false }
);

/** A rejected joint's repair: under which procedure revision and by whom. Append-only. */
export class JointRepair extends Model<
	InferAttributes<JointRepair>,
	InferCreationAttributes<JointRepair>
> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare jointId: number;
	declare inspectionId: number;
	/** 1 for the first repair of the joint, 2 for the next … */
	declare round: number;
	declare revisionId: number;
	declare welderId: number;
	declare note: string | null;
	declare recordedById: string;
	declare recordedByName: string;
	declare createdAt: CreationOptional<Date>;
}

JointRepair.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		jointId: { type: DataTypes.INTEGER, allowNull: false },
		inspectionId: { type: DataTypes.INTEGER, allowNull: false },
		round: { type: DataTypes.INTEGER, allowNull: false },
		revisionId: { type: DataTypes.INTEGER, allowNull: false },
		welderId: { type: DataTypes.INTEGER, allowNull: false },
		note: { type: DataTypes.STRING(500), allowNull: true },
		recordedById: { type: DataTypes.UUID, allowNull: false },
		recordedByName: { type: DataTypes.STRING(120), allowNull: false },
		createdAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'joint_repairs', updatedAt: false }
);
