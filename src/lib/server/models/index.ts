import { ApiToken } from './api-token';
import { AuditEvent } from './audit-event';
import { Account, Session, VerificationToken } from './auth-tables';
import { Invite } from './invite';
import { SettingsPhoto } from './settings-photo';
import { SettingsRecord } from './settings-record';
import { Shop } from './shop';
import { User } from './user';

Shop.hasMany(User, { foreignKey: 'shopId' });
User.belongsTo(Shop, { foreignKey: 'shopId' });
Shop.hasMany(Invite, { foreignKey: 'shopId' });
Invite.belongsTo(Shop, { foreignKey: 'shopId' });

Shop.hasMany(ApiToken, { foreignKey: 'shopId' });
ApiToken.belongsTo(Shop, { foreignKey: 'shopId' });
ApiToken.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });

Shop.hasMany(SettingsRecord, { foreignKey: 'shopId' });
SettingsRecord.belongsTo(Shop, { foreignKey: 'shopId' });
SettingsRecord.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
SettingsRecord.hasMany(SettingsPhoto, { foreignKey: 'recordId', as: 'photos' });
SettingsPhoto.belongsTo(SettingsRecord, { foreignKey: 'recordId' });

export {
	Account,
	ApiToken,
	AuditEvent,
	Invite,
	Session,
	SettingsPhoto,
	SettingsRecord,
	Shop,
	User,
	VerificationToken
};

export {
	ContinuityEntry,
	LapseNotice,
	Qualification,
	QualificationConfirmation,
	VerificationLink,
	Welder
} from './welders';
