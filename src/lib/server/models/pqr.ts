import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

export type PqrState = 'draft' | 'certified';

/**
 * A procedure qualification record: the actual values used on the coupon (`actualValues`), the
 * test results (`tests`) and the ranges computed from them (`qualified`), each a JSON document
 * of $lib/schemas/pqr. Certifying freezes it; corrections after that are addenda.
 */
export class Pqr extends Model<InferAttributes<Pqr>, InferCreationAttributes<Pqr>> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare number: string;
	declare title: string;
	declare process: string;
	/** Governing code of the qualification (migration 0011): asme-ix, aws-d1.1, iso-15614-1. */
	declare code: CreationOptional<string>;
	declare state: PqrState;
	declare actualValues: string;
	declare tests: string;
	declare qualified: string;
	declare authorId: string;
	declare certifiedById: CreationOptional<string | null>;
	declare certifiedName: CreationOptional<string | null>;
	declare certifiedAt: CreationOptional<Date | null>;
	/** SHA-256 of the canonical certified content; revisions that cite the PQR sign it too. */
	declare certifiedDigest: CreationOptional<string | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

const maybe = <T>(type: T) => ({ type, allowNull: true });

Pqr.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		number: { type: DataTypes.STRING(40), allowNull: false },
		title: { type: DataTypes.STRING(120), allowNull: false },
		process: { type: DataTypes.STRING(8), allowNull: false },
		code: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'asme-ix' },
		state: { type: DataTypes.STRING(12), allowNull: false },
		actualValues: { type: DataTypes.TEXT, allowNull: false },
		tests: { type: DataTypes.TEXT, allowNull: false },
		qualified: { type: DataTypes.TEXT, allowNull: false },
		authorId: { type: DataTypes.UUID, allowNull: false },
		certifiedById: maybe(DataTypes.UUID),
		certifiedName: maybe(DataTypes.STRING(120)),
		certifiedAt: maybe(DataTypes.DATE),
		certifiedDigest: maybe(DataTypes.STRING(64)),
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'pqrs' }
);

/** A lab report (PDF) of a PQR, stored under a random key with the SHA-256 of its bytes. */
export class PqrReport extends Model<
	InferAttributes<PqrReport>,
	InferCreationAttributes<PqrReport>
> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare pqrId: number;
	declare storageKey: string;
	declare originalName: string;
	declare bytes: number;
	declare sha256: string;
	declare uploadedById: string;
	declare removedAt: CreationOptional<Date | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

PqrReport.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		pqrId: { type: DataTypes.INTEGER, allowNull: false },
		storageKey: { type: DataTypes.STRING(80), allowNull: false },
		originalName: { type: DataTypes.STRING(200), allowNull: false },
		bytes: { type: DataTypes.INTEGER, allowNull: false },
		sha256: { type: DataTypes.STRING(64), allowNull: false },
		uploadedById: { type: DataTypes.UUID, allowNull: false },
		removedAt: maybe(DataTypes.DATE),
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'pqr_reports' }
);

/** A correction to a certified PQR; append-only (triggers in the migration). */
export class PqrAddendum extends Model<
	InferAttributes<PqrAddendum>,
	InferCreationAttributes<PqrAddendum>
> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare pqrId: number;
	declare authorId: string;
	declare authorName: string;
	declare body: string;
	declare createdAt: CreationOptional<Date>;
}

PqrAddendum.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		pqrId: { type: DataTypes.INTEGER, allowNull: false },
		authorId: { type: DataTypes.UUID, allowNull: false },
		authorName: { type: DataTypes.STRING(120), allowNull: false },
		body: { type: DataTypes.TEXT, allowNull: false },
		createdAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW }
	},
	{ sequelize, tableName: 'pqr_addenda', updatedAt: false }
);
