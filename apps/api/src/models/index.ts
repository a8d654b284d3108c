import type { Sequelize } from 'sequelize';
import { AuditEvent, initAuditEvent } from './audit-event.model';
import { Boat, initBoat } from './boat.model';
import { TacklePlan, initTacklePlan } from './tackle-plan.model';
import { ClubSetting, initClubSetting } from './club-setting.model';
import { EmailToken, initEmailToken } from './email-token.model';
import { Harbor, initHarbor } from './harbor.model';
import { OutboxEmail, initOutboxEmail } from './outbox-email.model';
import { Session, initSession } from './session.model';
import { User, initUser } from './user.model';
import { UserRole, initUserRole } from './user-role.model';

let initialised: Sequelize | null = null;

/** Initialises every model on `sequelize` and wires associations. Models are process-wide: the first instance wins. */
export function initModels(sequelize: Sequelize) {
  if (initialised) return;
  initUser(sequelize);
  initUserRole(sequelize);
  initEmailToken(sequelize);
  initSession(sequelize);
  initHarbor(sequelize);
  initClubSetting(sequelize);
  initOutboxEmail(sequelize);
  initAuditEvent(sequelize);
  initBoat(sequelize);
  initTacklePlan(sequelize);

  User.hasMany(UserRole, { as: 'roles', foreignKey: 'userId' });
  UserRole.belongsTo(User, { foreignKey: 'userId' });
  EmailToken.belongsTo(User, { foreignKey: 'userId' });
  AuditEvent.belongsTo(User, { as: 'actor', foreignKey: 'actorId' });
  User.hasMany(Boat, { foreignKey: 'ownerId' });
  Boat.belongsTo(User, { as: 'owner', foreignKey: 'ownerId' });
  Boat.hasMany(TacklePlan, { as: 'plans', foreignKey: 'boatId' });
  TacklePlan.belongsTo(Boat, { foreignKey: 'boatId' });
  initialised = sequelize;
}

export {
  AuditEvent,
  Boat,
  ClubSetting,
  TacklePlan,
  EmailToken,
  Harbor,
  OutboxEmail,
  Session,
  User,
  UserRole,
};
