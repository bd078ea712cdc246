import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes
} from 'sequelize';
import { sequelize } from '../db/sequelize';

/**
 * The short link /b/<token> of an approved revision, printed as the sheet's QR code. The token
 * (144 random bits) is stored as it is, unlike invite and API tokens which are hashed: every
 * reprint of the sheet must carry the same link, so the server must be able to print it again,
 * and the link opens nothing a hash would protect (status to anyone, values only after sign-in).
 * Revoking sets `revokedAt`; a reissue is a new row, so old sheets read "link withdrawn".
 */
export class BoothLink extends Model<
	InferAttributes<BoothLink>,
	InferCreationAttributes<BoothLink>
> {
	declare id: CreationOptional<number>;
	declare shopId: number;
	declare procedureId: number;
	declare revisionId: number;
	declare token: string;
	declare issuedAt: Date;
	declare issuedById: string | null;
	declare revokedAt: CreationOptional<Date | null>;
	declare revokedById: CreationOptional<string | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
}

BoothLink.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: false },
		procedureId: { type: DataTypes.INTEGER, allowNull: false },
		revisionId: { type: DataTypes.INTEGER, allowNull: false },
		token: { type: DataTypes.STRING(40), allowNull: false },
		issuedAt: { type: DataTypes.DATE, allowNull: false },
		issuedById: { type: DataTypes.UUID, allowNull: true },
		revokedAt: { type: DataTypes.DATE, allowNull: true },
		revokedById: { type: DataTypes.UUID, allowNull: true },
		createdAt: DataTypes.DATE,
		updatedAt: DataTypes.DATE
	},
	{ sequelize, tableName: 'booth_links' }
);

export type LookupOutcome = 'ok' | 'revoked' | 'unknown' | 'limited' | 'continuity';

/**
 * The lookups of a booth link (or, for unknown and limited ones, of an address) with one outcome
 * in one window: who looked first (if signed in), from where, what they were shown, how many
 * lookups the window had and when the last one was. Rows from before the windows (migration
 * 0008) have no bucket and count one lookup each.
 */
export class BoothLookup extends Model<
	InferAttributes<BoothLookup>,
	InferCreationAttributes<BoothLookup>
> {
	declare id: CreationOptional<number>;
	declare shopId: number | null;
	declare linkId: number | null;
	declare outcome: LookupOutcome;
	declare userId: string | null;
	declare ip: string | null;
	declare userAgent: string | null;
	declare at: Date;
	declare bucket: CreationOptional<string | null>;
	declare windowStart: CreationOptional<number | null>;
	declare hits: CreationOptional<number>;
	declare lastAt: CreationOptional<Date | null>;
}

BoothLookup.init(
	{
		id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
		shopId: { type: DataTypes.INTEGER, allowNull: true },
		linkId: { type: DataTypes.INTEGER, allowNull: true },
		outcome: { type: DataTypes.STRING(12), allowNull: false },
		userId: { type: DataTypes.UUID, allowNull: true },
		ip: { type: DataTypes.STRING(64), allowNull: true },
		userAgent: { type: DataTypes.STRING(300), allowNull: true },
		at: { type: DataTypes.DATE, allowNull: false },
		bucket: { type: DataTypes.STRING(120), allowNull: true },
		windowStart: {
			type: DataTypes.BIGINT,
			allowNull: true,
			get(this: BoothLookup) {
				const v = this.getDataValue('windowStart');
				return v == null ? null : Number(v); // pg answers BIGINT as a string
			}
		},
		hits: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
		lastAt: { type: DataTypes.DATE, allowNull: true }
	},
	{ sequelize, tableName: 'booth_lookups', timestamps: false }
);
