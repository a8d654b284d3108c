import { Op, type Transaction } from 'sequelize';

import type { ModerationDecision } from '../../models';
import { AuditEvent, Comment, ListingReport, Post, Report, User } from '../../models';
import { recordAudit } from '../audit/audit.service';
import { POST_INCLUDE } from '../posts/post-access';

export interface ModContext {
  publicUrl: string;
}

/** A moderated row and the decision kept for Undo. */
export interface Decided<T> {
  row: T;
  decision: ModerationDecision;
}

/** Writes one moderation entry to the audit log (inside `transaction` when given); an empty reason is stored as null. */
export const moderationAudit = (
  actor: User,
  action: string,
  type: string,
  id: number,
  reason: string,
  details?: unknown,
  transaction?: Transaction,
) =>
  recordAudit(
    {
      actorId: actor.id,
      area: 'moderation',
      action,
      subjectType: type,
      subjectId: String(id),
      reason: reason || null,
      details: details ?? null,
    },
    transaction,
  );

/** Runs `work` in one managed transaction of the models' connection. */
export const inTransaction = <T>(work: (t: Transaction) => Promise<T>): Promise<T> => {
  const sequelize = Post.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  return sequelize.transaction(work);
};

/** Posts waiting for a moderator: new ones, and published ones with an edit waiting. */
const WAITING_POSTS = {
  [Op.or]: [{ status: 'pending' }, { status: 'approved', revisionStatus: 'pending' }],
};

/** Pending posts and comments, oldest first, and open reports. */
export async function queue() {
  const [posts, comments, reports] = await Promise.all([
    Post.findAll({
      where: WAITING_POSTS,
      include: POST_INCLUDE,
      order: [['updatedAt', 'ASC']],
    }),
    Comment.findAll({
      where: { status: 'pending' },
      include: [
        { model: User, as: 'author', attributes: ['id', 'displayName'] },
        { model: Post, as: 'post', attributes: ['id', 'title'] },
      ],
      order: [['id', 'ASC']],
    }),
    Report.findAll({
      where: { status: 'open' },
      include: [{ model: User, as: 'reporter', attributes: ['id', 'displayName'] }],
      order: [['id', 'ASC']],
    }),
  ]);
  return { posts, comments, reports };
}

/** What moderators do on the exchange (written by the listings module) also belongs in their log. */
const LISTING_MODERATION_ACTIONS = ['listing.hide', 'listing.unhide', 'listing-report.dismiss'];
const LISTING_AREA_UNDO = { area: 'exchange', action: 'decision.undo' };

/** How much waits for a moderator (for the navigation badge), listing reports included. */
export async function counts() {
  const [pendingPosts, pendingComments, openReports, openListingReports] = await Promise.all([
    Post.count({
      where: WAITING_POSTS,
    }),
    Comment.count({ where: { status: 'pending' } }),
    Report.count({ where: { status: 'open' } }),
    ListingReport.count({ where: { status: 'open' } }),
  ]);
  return {
    pendingPosts,
    pendingComments,
    openReports,
    openListingReports,
    total: pendingPosts + pendingComments + openReports + openListingReports,
  };
}

/** Moderation entries of the audit log, newest first, 50 a page. */
export async function auditLog(page: number) {
  const { rows, count } = await AuditEvent.findAndCountAll({
    where: {
      [Op.or]: [
        { area: 'moderation' },
        { action: { [Op.in]: LISTING_MODERATION_ACTIONS } },
        LISTING_AREA_UNDO,
      ],
    },
    include: [{ model: User, as: 'actor', attributes: ['id', 'displayName'] }],
    order: [['id', 'DESC']],
    limit: 50,
    offset: (page - 1) * 50,
  });
  return { rows, total: count };
}
