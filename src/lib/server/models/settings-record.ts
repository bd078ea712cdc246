import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import type { MetalFamily, Process } from '$lib/weld';
import { sequelize } from '../db/sequelize';

/** One weld's settings as used, in SI, with the findings computed when it was saved. */
export class SettingsRecord extends Model<
	InferAttributes<SettingsRecord>,
	InferCreationAttributes<SettingsRecord>
> {
	declare id: CreationOptional<number>;
	declare shopId: ForeignKey<number>;
	declare authorId: ForeignKey<string>;
	declare process: Process;
	declare currentType: string | null;
	declare transfer: string | null;
	declare amps: number | null;
	declare volts: number | null;
	declare wireFeedMmPerS: number | null;
	declare travelSpeedMmPerS: number | null;
	declare fillerClass: string | null;
	declare fillerDiameterMm: number | null;
	declare tungstenClass: string | null;
	declare tungstenDiameterMm: number | null;
	declare gasName: string | null;
	declare gasFlowLPerMin: number | null;
	declare baseMetalSpec: string | null;
	/** Derived from the spec by the weld core when saved; null when the spec is unknown. */
	declare baseMetalFamily: MetalFamily | null;
	declare pNumber: string | null;
	declare thicknessMm: number | null;
	declare jointType: string | null;
	declare position: string | null;
	declare preheatC: number | null;
	declare interpassC: number | null;
	/** The shop's own name for the machine or power source. */
	declare machine: string | null;
	declare jobRef: string | null;
	/** The outcome in the engineer's words, and the kind read from them (sound/rework/...). */
	declare outcome: string | null;
	declare outcomeKind: string | null;
	declare defects: string | null;
	declare notes: string | null;
	declare weldedOn: string;
	/** JSON: the text typed for each quantity ("3/32"), so an edit shows it as typed. */
	declare entered: string;
	/** JSON: the findings of POST /api/v1/checks' computation at save time. */
	declare findings: string;
	/** JSON: heat input, lens shade, filler and base metal facts at save time. */
	declare derived: string;
	declare cautionCount: number;
	/** Lower-case text the list's search runs over (job, machine, notes, filler, metal...). */
	declare searchText: string;
	/** Set when a procedure cites the record; a frozen record cannot be edited. */
	declare frozenAt: CreationOptional<Date | null>;
	declare citedByProcedureId: CreationOptional<number | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

// A fresh object per attribute: Sequelize writes the column name into the one it is given.
const real = () => ({ type: DataTypes.REAL, allowNull: true });
const str = (n: number) => ({ type: DataTypes.STRING(n), allowNull: true });

SettingsRecord.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		authorId: { type: DataTypes.UUID, allowNull: false },
		process: { type: DataTypes.STRING(8), allowNull: false },
		currentType: str(8),
		transfer: str(16),
		amps: real(),
		volts: real(),
		wireFeedMmPerS: real(),
		travelSpeedMmPerS: real(),
		fillerClass: str(40),
		fillerDiameterMm: real(),
		tungstenClass: str(20),
		tungstenDiameterMm: real(),
		gasName: str(60),
		gasFlowLPerMin: real(),
		baseMetalSpec: str(60),
		baseMetalFamily: str(16),
		pNumber: str(8),
		thicknessMm: real(),
		jointType: str(16),
		position: str(4),
		preheatC: real(),
		interpassC: real(),
		machine: str(80),
		jobRef: str(80),
		outcome: str(60),
		outcomeKind: str(12),
		defects: { type: DataTypes.TEXT, allowNull: true },
		notes: { type: DataTypes.TEXT, allowNull: true },
		weldedOn: { type: DataTypes.DATEONLY, allowNull: false },
		entered: { type: DataTypes.TEXT, allowNull: false, defaultValue: '{}' },
		findings: { type: DataTypes.TEXT, allowNull: false, defaultValue: '[]' },
		derived: { type: DataTypes.TEXT, allowNull: false, defaultValue: '{}' },
		cautionCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
		searchText: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
		frozenAt: { type: DataTypes.DATE, allowNull: true },
		citedByProcedureId: { type: DataTypes.INTEGER, allowNull: true },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'settings_records' }
);
