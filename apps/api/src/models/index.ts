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
import { Membership, initMembership } from './membership.model';
import { MembershipPlan, initMembershipPlan } from './membership-plan.model';
import { Payment, initPayment } from './payment.model';
import { ProviderEvent, initProviderEvent } from './provider-event.model';
import { Refund, initRefund } from './refund.model';
import { Comment, initComment } from './comment.model';
import { Notification, initNotification } from './notification.model';
import { Post, initPost } from './post.model';
import { Report, initReport } from './report.model';
import { Topic, initTopic } from './topic.model';
import { Vote, initVote } from './vote.model';
import { UploadedImage, initUploadedImage } from './uploaded-image.model';
import { ModerationDecision, initModerationDecision } from './moderation-decision.model';
import { initExchangeModels } from './exchange.models';
import { StormReadiness, StormWatch, initStormModels } from './storm.models';

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
  initMembershipPlan(sequelize);
  initMembership(sequelize);
  initPayment(sequelize);
  initRefund(sequelize);
  initProviderEvent(sequelize);
  initTopic(sequelize);
  initPost(sequelize);
  initComment(sequelize);
  initVote(sequelize);
  initReport(sequelize);
  initNotification(sequelize);
  initUploadedImage(sequelize);
  initModerationDecision(sequelize);

  User.hasMany(UserRole, { as: 'roles', foreignKey: 'userId' });
  UserRole.belongsTo(User, { foreignKey: 'userId' });
  EmailToken.belongsTo(User, { foreignKey: 'userId' });
  AuditEvent.belongsTo(User, { as: 'actor', foreignKey: 'actorId' });
  User.hasMany(Boat, { foreignKey: 'ownerId' });
  Boat.belongsTo(User, { as: 'owner', foreignKey: 'ownerId' });
  Boat.hasMany(TacklePlan, { as: 'plans', foreignKey: 'boatId' });
  TacklePlan.belongsTo(Boat, { foreignKey: 'boatId' });
  Membership.belongsTo(MembershipPlan, { as: 'plan', foreignKey: 'planId' });
  Membership.belongsTo(User, { as: 'user', foreignKey: 'userId' });
  User.hasOne(Membership, { as: 'membership', foreignKey: 'userId' });
  Payment.belongsTo(User, { as: 'user', foreignKey: 'userId' });
  Payment.belongsTo(MembershipPlan, { as: 'plan', foreignKey: 'planId' });
  Payment.hasMany(Refund, { as: 'refunds', foreignKey: 'paymentId' });
  Refund.belongsTo(Payment, { as: 'payment', foreignKey: 'paymentId' });
  Post.belongsTo(User, { as: 'author', foreignKey: 'authorId' });
  Post.belongsTo(Topic, { as: 'topic', foreignKey: 'topicId' });
  Post.hasMany(Comment, { as: 'comments', foreignKey: 'postId' });
  Comment.belongsTo(Post, { as: 'post', foreignKey: 'postId' });
  Comment.belongsTo(User, { as: 'author', foreignKey: 'authorId' });
  Report.belongsTo(User, { as: 'reporter', foreignKey: 'reporterId' });
  initExchangeModels(sequelize);
  initStormModels(sequelize);
  StormWatch.belongsTo(User, { as: 'openedBy', foreignKey: 'openedById' });
  StormReadiness.belongsTo(Boat, { as: 'boat', foreignKey: 'boatId' });
  StormReadiness.belongsTo(User, { as: 'buddy', foreignKey: 'buddyUserId' });
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
  Membership,
  MembershipPlan,
  Payment,
  ProviderEvent,
  Refund,
  Comment,
  Notification,
  Post,
  Report,
  Topic,
  Vote,
  StormWatch,
  StormReadiness,
  UploadedImage,
  ModerationDecision,
};
// The exchange's models, registered by initExchangeModels.
export { Listing } from './listing.model';
export { ListingMessage } from './listing-message.model';
export { ListingPhoto } from './listing-photo.model';
export { ListingReport } from './listing-report.model';
export { ListingThread } from './listing-thread.model';
export { SavedSearch, SavedSearchHit } from './saved-search.model';
export type { PostRevision } from './post.model';
export type { DecisionNotices, RowChange } from './moderation-decision.model';
