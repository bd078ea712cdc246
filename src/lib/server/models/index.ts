import { ApiToken } from './api-token';
import { AuditEvent } from './audit-event';
import { BoothLink, BoothLookup } from './booth-link';
import { Account, Session, VerificationToken } from './auth-tables';
import { Invite } from './invite';
import { Procedure, ProcedureNumbering } from './procedure';
import { ProcedureRevision, RevisionPqr, RevisionRecord } from './procedure-revision';
import { Pqr, PqrAddendum, PqrReport } from './pqr';
import { SettingsPhoto } from './settings-photo';
import { SettingsRecord } from './settings-record';
import { JobLease, WindowCounter } from './shared-state';
import { Shop } from './shop';
import { SignOff } from './sign-off';
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

// Procedures (issue #5): revisions, their PQR and record links, sign-offs; PQRs with reports.
Procedure.hasMany(ProcedureRevision, { foreignKey: 'procedureId', as: 'revisions' });
ProcedureRevision.belongsTo(Procedure, { foreignKey: 'procedureId' });
ProcedureRevision.hasMany(SignOff, { foreignKey: 'revisionId', as: 'signOffs' });
ProcedureRevision.hasMany(RevisionPqr, { foreignKey: 'revisionId', as: 'pqrLinks' });
ProcedureRevision.hasMany(RevisionRecord, { foreignKey: 'revisionId', as: 'recordLinks' });
Pqr.hasMany(PqrReport, { foreignKey: 'pqrId', as: 'reports' });
Pqr.hasMany(PqrAddendum, { foreignKey: 'pqrId', as: 'addenda' });

// Booth links (issue #6): the sheet's QR link of a revision, and its lookups.
ProcedureRevision.hasMany(BoothLink, { foreignKey: 'revisionId', as: 'boothLinks' });
BoothLink.belongsTo(ProcedureRevision, { foreignKey: 'revisionId' });
BoothLink.hasMany(BoothLookup, { foreignKey: 'linkId', as: 'lookups' });

export {
	Account,
	ApiToken,
	AuditEvent,
	BoothLink,
	BoothLookup,
	Invite,
	JobLease,
	Pqr,
	PqrAddendum,
	PqrReport,
	Procedure,
	ProcedureNumbering,
	ProcedureRevision,
	RevisionPqr,
	RevisionRecord,
	Session,
	SettingsPhoto,
	SettingsRecord,
	Shop,
	SignOff,
	User,
	VerificationToken,
	WindowCounter
};

export {
	ContinuityEntry,
	LapseNotice,
	Qualification,
	QualificationConfirmation,
	VerificationLink,
	Welder
} from './welders';

export { ContinuityTap } from './continuity-tap';

export { Job, JobJoint, JointInspection, JointRepair, WeldLog, WeldOverride } from './jobs';

export { DataBook } from './data-book';
