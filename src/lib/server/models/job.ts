import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

/** A job of the shop: one part or drawing for a customer, welded to a governing code. */
export class Job extends Model<InferAttributes<Job>, InferCreationAttributes<Job>> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	/** The shop's job number; unique in the shop. */
	declare number: string;
	declare customer: string;
	declare part: string;
	declare drawing: string;
	declare drawingRev: string;
	declare code: string;
	declare dueOn: string | null;
	/** The attached drawing (PDF or image), if any: storage key, name as sent, SHA-256. */
	declare drawingKey: CreationOptional<string | null>;
	declare drawingName: CreationOptional<string | null>;
	declare drawingSha256: CreationOptional<string | null>;
	/** An image drawing's size in pixels (null for a PDF). */
	declare drawingWidth: CreationOptional<number | null>;
	declare drawingHeight: CreationOptional<number | null>;
	declare createdById: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

Job.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		number: { type: DataTypes.STRING(40), allowNull: false },
		customer: { type: DataTypes.STRING(120), allowNull: false },
		part: { type: DataTypes.STRING(120), allowNull: false },
		drawing: { type: DataTypes.STRING(60), allowNull: false },
		drawingRev: { type: DataTypes.STRING(20), allowNull: false },
		code: { type: DataTypes.STRING(16), allowNull: false },
		dueOn: { type: DataTypes.DATEONLY, allowNull: true },
		drawingKey: { type: DataTypes.STRING(80), allowNull: true },
		drawingName: { type: DataTypes.STRING(200), allowNull: true },
		drawingSha256: { type: DataTypes.STRING(64), allowNull: true },
		drawingWidth: { type: DataTypes.INTEGER, allowNull: true },
		drawingHeight: { type: DataTypes.INTEGER, allowNull: true },
		createdById: { type: DataTypes.UUID, allowNull: false },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'jobs' }
);

/** One weld of a job, named by the shop's mark (W1, W2 …), to be welded to one revision. */
export class JobJoint extends Model<InferAttributes<JobJoint>, InferCreationAttributes<JobJoint>> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare jobId: number;
	declare mark: string;
	declare jointType: string;
	declare size: string;
	declare baseMetals: string;
	declare position: string;
	declare revisionId: number;
	/** Where the joint is marked on the job's drawing, as fractions (0–1) of its width and height. */
	declare markerX: CreationOptional<number | null>;
	declare markerY: CreationOptional<number | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

JobJoint.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		jobId: { type: DataTypes.INTEGER, allowNull: false },
		mark: { type: DataTypes.STRING(20), allowNull: false },
		jointType: { type: DataTypes.STRING(12), allowNull: false },
		size: { type: DataTypes.STRING(40), allowNull: false },
		baseMetals: { type: DataTypes.STRING(120), allowNull: false },
		position: { type: DataTypes.STRING(4), allowNull: false },
		revisionId: { type: DataTypes.INTEGER, allowNull: false },
		markerX: { type: DataTypes.REAL, allowNull: true },
		markerY: { type: DataTypes.REAL, allowNull: true },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'job_joints' }
);
