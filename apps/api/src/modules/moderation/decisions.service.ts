import { Op, type Model, type Transaction } from 'sequelize';
import { UNDO_WINDOW_MS } from '@app/shared';
import { AppError, notFound } from '../../errors/app-error';
import { ModerationDecision, Notification, OutboxEmail, User, type RowChange } from '../../models';
import type { AuditArea } from '../../models/audit-event.model';
import { recordAudit } from '../audit/audit.service';
import { canon, fromJson, MODELS, toJson } from '../audit/decision-record';
import { refreshListing } from '../listings/listing-index';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { notify } from '../posts/notifications.service';
import { indexPost } from '../posts/post-index';
import { canUndoDecision } from '../../policies/moderation';

export interface UndoContext {
  publicUrl: string;
}

const conflict = (message: string) => new AppError('CONFLICT', message);

/** What the author (or seller, or reporter) reads when a notice they already had is corrected. */
function correctionOf(d: ModerationDecision) {
  const what = d.title ? `“${d.title}”` : 'it';
  if (d.subjectType === 'listing')
    return {
      subject: `Correction: your listing is shown again: ${d.title}`,
      lines: [
        `A moderator undid hiding ${what}: it is back on the exchange.`,
        'Please ignore the earlier e-mail.',
      ],
    };
  if (d.subjectType === 'report')
    return {
      subject: 'Correction: your report is open again',
      lines: [`A moderator reopened your report on ${what}; it is waiting for a moderator again.`],
    };
  return {
    subject: `Correction: ${what} is waiting for a moderator again`,
    lines: [
      `A moderator undid the decision on ${what}. It is back with the moderators, and you will hear when it is decided.`,
      'Please ignore the earlier message.',
    ],
  };
}

/**
 * Undoes a decision made less than `UNDO_WINDOW_MS` ago, by the moderator who made it or by an admin: every row
 * it changed goes back to what it held, unread notices and unsent e-mails are withdrawn, and whoever already
 * read or received one gets a correction. CONFLICT when it was undone already, when the window has passed,
 * or when anyone has changed those rows since (nothing is changed then). Logged in the audit log.
 */
export async function undoDecision(ctx: UndoContext, actor: User, decisionId: number) {
  const sequelize = ModerationDecision.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  const decision = await sequelize.transaction(async (t) => {
    const d = await ModerationDecision.findByPk(decisionId, {
      transaction: t,
      lock: t.LOCK.UPDATE,
    });
    if (!d) throw notFound('Decision');
    if (!canUndoDecision(actor, d))
      throw new AppError(
        'FORBIDDEN',
        'Only the moderator who made this decision, or an admin, can undo it',
      );
    if (d.undoneAt) throw conflict('This decision has already been undone');
    if (Date.now() - d.createdAt.getTime() > UNDO_WINDOW_MS)
      throw conflict(
        `Too late to undo: a decision can be undone for ${UNDO_WINDOW_MS / 60_000} minutes. Open the item and decide it again instead.`,
      );
    const later = await ModerationDecision.count({
      where: {
        subjectType: d.subjectType,
        subjectId: d.subjectId,
        id: { [Op.gt]: d.id },
        undoneAt: null,
      },
      transaction: t,
    });
    if (later > 0)
      throw conflict('Someone has decided this again since, so this decision cannot be undone');
    const rows: Array<[Model, RowChange]> = [];
    for (const c of d.changes) {
      const row = await MODELS[c.kind].findByPk(c.id, { transaction: t, lock: t.LOCK.UPDATE });
      if (!row) throw conflict(`The ${c.kind.replace('-', ' ')} has been deleted since`);
      for (const [f, v] of Object.entries(c.after))
        if (canon(toJson(row.get(f))) !== canon(v))
          throw conflict(
            `Someone has changed this ${c.kind.replace('-', ' ')} since the decision, so it cannot be undone`,
          );
      rows.push([row, c]);
    }
    for (const [row, c] of rows)
      await row.update(
        Object.fromEntries(Object.entries(c.before).map(([f, v]) => [f, fromJson(v)])),
        { transaction: t },
      );
    await withdrawNotices(ctx, d, t);
    await recordAudit(
      {
        actorId: actor.id,
        area: d.area as AuditArea,
        action: 'decision.undo',
        subjectType: d.subjectType,
        subjectId: String(d.subjectId),
        reason: null,
        details: { decisionId: d.id, undid: d.action, title: d.title },
      },
      t,
    );
    await d.update({ undoneAt: new Date(), undoneById: actor.id }, { transaction: t });
    return d;
  });
  for (const c of decision.changes) {
    if (c.kind === 'post') await indexPost(c.id);
    if (c.kind === 'listing') await refreshListing(c.id);
  }
  return decision;
}

/**
 * Unread in-app notices are deleted and unsent e-mails taken out of the outbox; a notice already read or an
 * e-mail already sent (or being sent) is followed by a correction, in the app and by e-mail respectively.
 */
async function withdrawNotices(ctx: UndoContext, d: ModerationDecision, t: Transaction) {
  const correctInApp = new Set<number>();
  const correctByMail = new Set<number>();
  for (const id of d.notices.notifications) {
    const n = await Notification.findByPk(id, { transaction: t });
    if (!n) continue;
    if (n.readAt) correctInApp.add(n.userId);
    else await n.destroy({ transaction: t });
  }
  for (const { emailId, userId } of d.notices.emailTo) {
    const removed = await OutboxEmail.destroy({
      where: {
        id: emailId,
        sentAt: null,
        [Op.or]: [{ lockedUntil: null }, { lockedUntil: { [Op.lt]: new Date() } }],
      },
      transaction: t,
    });
    if (removed === 0 && (await OutboxEmail.count({ where: { id: emailId }, transaction: t })) > 0)
      correctByMail.add(userId);
  }
  const { subject, lines } = correctionOf(d);
  const path = d.notices.path ?? null;
  for (const userId of new Set([...correctInApp, ...correctByMail])) {
    await notify(userId, 'moderation', subject, path, t);
    const user = correctByMail.has(userId) ? await User.findByPk(userId, { transaction: t }) : null;
    if (user)
      await enqueueEmail(
        actionEmail({
          to: user.email,
          kind: 'moderation',
          subject,
          greeting: `Hello ${user.displayName},`,
          lines,
          ...(path ? { actionLabel: 'Open it', actionUrl: `${ctx.publicUrl}${path}` } : {}),
          footer: 'You get this e-mail because an earlier message about this was sent in error.',
        }),
        t,
      );
  }
}
