import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

export type RevisionState = 'draft' | 'in-review' | 'approved' | 'superseded' | 'withdrawn';

/**
 * One revision of a procedure. `variables` is the JSON document of $lib/schemas/procedure
 * (every variable as a range or a set, in SI); only a draft's document may change.
 */
export class ProcedureRevision extends Model<
	InferAttributes<ProcedureRevision>,
	InferCreationAttributes<ProcedureRevision>
> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare procedureId: number;
	declare rev: number;
	declare state: RevisionState;
	declare variables: string;
	declare process: string;
	declare code: string;
	declare baseMetalFamily: string | null;
	declare authorId: string;
	declare submittedById: CreationOptional<string | null>;
	declare submittedAt: CreationOptional<Date | null>;
	declare decidedAt: CreationOptional<Date | null>;
	/** The inspector's comment when the revision was last returned to draft. */
	declare returnComment: CreationOptional<string | null>;
	declare supersededAt: CreationOptional<Date | null>;
	declare supersededByRev: CreationOptional<number | null>;
	declare withdrawnAt: CreationOptional<Date | null>;
	declare withdrawnById: CreationOptional<string | null>;
	declare withdrawReason: CreationOptional<string | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

const maybe = <T>(type: T) => ({ type, allowNull: true });

ProcedureRevision.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		procedureId: { type: DataTypes.INTEGER, allowNull: false },
		rev: { type: DataTypes.INTEGER, allowNull: false },
		state: { type: DataTypes.STRING(12), allowNull: false },
		variables: { type: DataTypes.TEXT, allowNull: false },
		process: { type: DataTypes.STRING(8), allowNull: false },
		code: { type: DataTypes.STRING(16), allowNull: false },
		baseMetalFamily: maybe(DataTypes.STRING(16)),
		authorId: { type: DataTypes.UUID, allowNull: false },
		submittedById: maybe(DataTypes.UUID),
		submittedAt: maybe(DataTypes.DATE),
		decidedAt: maybe(DataTypes.DATE),
		returnComment: maybe(DataTypes.TEXT),
		supersededAt: maybe(DataTypes.DATE),
		supersededByRev: maybe(DataTypes.INTEGER),
		withdrawnAt: maybe(DataTypes.DATE),
		withdrawnById: maybe(DataTypes.UUID),
		withdrawReason: maybe(DataTypes.TEXT),
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'procedure_revisions' }
);

/** A PQR that supports a revision. */
export class RevisionPqr extends Model<
	InferAttributes<RevisionPqr>,
	InferCreationAttributes<RevisionPqr>
> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare revisionId: number;
	declare pqrId: number;
}

RevisionPqr.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		revisionId: { type: DataTypes.INTEGER, allowNull: false },
		pqrId: { type: DataTypes.INTEGER, allowNull: false }
	},
	{ sequelize, tableName: 'procedure_revision_pqrs', timestamps: false }
);

/** A settings record a revision cites (citing freezes the record). */
export class RevisionRecord extends Model<
	InferAttributes<RevisionRecord>,
	InferCreationAttributes<RevisionRecord>
> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare revisionId: number;
	declare recordId: number;
}

RevisionRecord.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		revisionId: { type: DataTypes.INTEGER, allowNull: false },
		recordId: { type: DataTypes.INTEGER, allowNull: false }
	},
	{ sequelize, tableName: 'procedure_revision_records', timestamps: false }
);
