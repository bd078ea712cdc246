import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

import type { WeldPass } from '$lib/jobs/types';

export type { WeldPass };

/** "Welded by me": one pass of one joint (round 0, or a repair's round). Append-only. */
export class WeldLog extends Model<InferAttributes<WeldLog>, InferCreationAttributes<WeldLog>> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare jointId: number;
	declare welderId: number;
	declare pass: WeldPass;
	declare weldedOn: string;
	declare revisionId: number;
	declare round: CreationOptional<number>;
	declare overrideId: number | null;
	declare continuityEntryId: number | null;
	declare recordedById: string;
	declare recordedByName: string;
	declare createdAt: CreationOptional<Date>;
}

WeldLog.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		jointId: { type: DataTypes.INTEGER, allowNull: false },
		welderId: { type: DataTypes.INTEGER, allowNull: false },
		pass: { type: DataTypes.STRING(8), allowNull: false },
		weldedOn: { type: DataTypes.DATEONLY, allowNull: false },
		revisionId: { type: DataTypes.INTEGER, allowNull: false },
		round: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
		overrideId: { type: DataTypes.INTEGER, allowNull: true },
		continuityEntryId: { type: DataTypes.INTEGER, allowNull: true },
		recordedById: { type: DataTypes.UUID, allowNull: false },
		recordedByName: { type: DataTypes.STRING(120), allowNull: false },
		createdAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'weld_logs', updatedAt: false }
);

/** The signature columns shared by overrides and inspections (as a procedure's sign-off). */
const signed = {
	signedById: { type: DataTypes.UUID, allowNull: false },
	printedName: { type: DataTypes.STRING(120), allowNull: false },
	role: { type: DataTypes.STRING(20), allowNull: false },
	signedAt: { type: DataTypes.DATE, allowNull: false },
	digest: { type: DataTypes.STRING(64), allowNull: false },
	canonical: { type: DataTypes.TEXT, allowNull: false },
	seal: { type: DataTypes.STRING(64), allowNull: false }
};
export const SIGNED_COLUMNS = signed;

export interface Signed {
	signedById: string;
	printedName: string;
	role: string;
	signedAt: Date;
	digest: string;
	canonical: string;
	seal: string;
}

/** An inspector lets a welder log a joint the server refused, with a reason. Append-only. */
export class WeldOverride
	extends Model<InferAttributes<WeldOverride>, InferCreationAttributes<WeldOverride>>
	implements Signed
{
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare jointId: number;
	declare welderId: number;
	/** What the server said when it refused, kept with the override. */
	declare refusal: string;
	declare reason: string;
	declare signedById: string;
	declare printedName: string;
	declare role: string;
	declare signedAt: Date;
	declare digest: string;
	declare canonical: string;
	declare seal: string;
}

WeldOverride.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		jointId: { type: DataTypes.INTEGER, allowNull: false },
		welderId: { type: DataTypes.INTEGER, allowNull: false },
		refusal: { type: DataTypes.STRING(500), allowNull: false },
		reason: { type: DataTypes.STRING(500), allowNull: false },
		...signed
	},
	{ sequelize, tableName: 'weld_overrides', timestamps: false }
);
