import { models as adapterModels } from '@auth/sequelize-adapter';
import { sequelize } from '../db/sequelize';

// The Auth.js adapter's own tables, defined with its column sets so our migrations own the schema.
const options = { underscored: true, timestamps: false };

export const Account = sequelize.define('account', adapterModels.Account, {
	...options,
	tableName: 'accounts'
});
export const Session = sequelize.define('session', adapterModels.Session, {
	...options,
	tableName: 'sessions'
});
export const VerificationToken = sequelize.define(
	'verificationToken',
	adapterModels.VerificationToken,
	{ ...options, tableName: 'verification_tokens' }
);
