import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

/**
 * A procedure (WPS): a shop-unique number and its revisions. Title, code, process, material and
 * state mirror the head (newest) revision so the list filters on indexed columns.
 */
export class Procedure extends Model<
	InferAttributes<Procedure>,
	InferCreationAttributes<Procedure>
> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare number: string;
	declare title: string;
	declare code: string;
	declare process: string;
	declare baseMetalFamily: string | null;
	declare state: string;
	declare headRev: number;
	/** The revision in force, if any. */
	declare approvedRev: CreationOptional<number | null>;
	declare searchText: CreationOptional<string>;
	declare createdById: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

Procedure.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		number: { type: DataTypes.STRING(40), allowNull: false },
		title: { type: DataTypes.STRING(120), allowNull: false },
		code: { type: DataTypes.STRING(16), allowNull: false },
		process: { type: DataTypes.STRING(8), allowNull: false },
		baseMetalFamily: { type: DataTypes.STRING(16), allowNull: true },
		state: { type: DataTypes.STRING(12), allowNull: false },
		headRev: { type: DataTypes.INTEGER, allowNull: false },
		approvedRev: { type: DataTypes.INTEGER, allowNull: true },
		searchText: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
		createdById: { type: DataTypes.UUID, allowNull: false },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'procedures' }
);

/** The shop's numbering patterns for procedures and PQRs (a row only once the shop sets one). */
export class ProcedureNumbering extends Model<
	InferAttributes<ProcedureNumbering>,
	InferCreationAttributes<ProcedureNumbering>
> {
	declare shopId: number;
	declare wpsPattern: string;
	declare pqrPattern: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

ProcedureNumbering.init(
	{
		shopId: { type: DataTypes.INTEGER, primaryKey: true },
		wpsPattern: { type: DataTypes.STRING(40), allowNull: false },
		pqrPattern: { type: DataTypes.STRING(40), allowNull: false },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'procedure_numbering' }
);
