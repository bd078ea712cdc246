import { ApiToken } from './api-token';
import { AuditEvent } from './audit-event';
import { Account, Session, VerificationToken } from './auth-tables';
import { Invite } from './invite';
import { Shop } from './shop';
import { User } from './user';

Shop.hasMany(User, { foreignKey: 'shopId' });
User.belongsTo(Shop, { foreignKey: 'shopId' });
Shop.hasMany(Invite, { foreignKey: 'shopId' });
Invite.belongsTo(Shop, { foreignKey: 'shopId' });

Shop.hasMany(ApiToken, { foreignKey: 'shopId' });
ApiToken.belongsTo(Shop, { foreignKey: 'shopId' });
ApiToken.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });

export { Account, ApiToken, AuditEvent, Invite, Session, Shop, User, VerificationToken };
