// The welder models and their associations, kept apart from index.ts so parallel features add
// one line there each. Import models from './index' (or '$lib/server/models'), not from here.
import { ContinuityEntry } from './continuity-entry';
import { LapseNotice } from './lapse-notice';
import { Qualification } from './qualification';
import { QualificationConfirmation } from './qualification-confirmation';
import { Shop } from './shop';
import { User } from './user';
import { VerificationLink } from './verification-link';
import { Welder } from './welder';

Shop.hasMany(Welder, { foreignKey: 'shopId' });
Welder.belongsTo(Shop, { foreignKey: 'shopId' });
Welder.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Welder.hasMany(Qualification, { foreignKey: 'welderId', as: 'qualifications' });
Qualification.belongsTo(Welder, { foreignKey: 'welderId', as: 'welder' });
Welder.hasMany(ContinuityEntry, { foreignKey: 'welderId', as: 'uses' });
ContinuityEntry.belongsTo(Welder, { foreignKey: 'welderId' });
Qualification.hasMany(QualificationConfirmation, {
	foreignKey: 'qualificationId',
	as: 'confirmations'
});
QualificationConfirmation.belongsTo(Qualification, { foreignKey: 'qualificationId' });
Qualification.hasMany(LapseNotice, { foreignKey: 'qualificationId', as: 'notices' });
Welder.hasMany(VerificationLink, { foreignKey: 'welderId', as: 'links' });
VerificationLink.belongsTo(Welder, { foreignKey: 'welderId', as: 'welder' });

export {
	ContinuityEntry,
	LapseNotice,
	Qualification,
	QualificationConfirmation,
	VerificationLink,
	Welder
};
