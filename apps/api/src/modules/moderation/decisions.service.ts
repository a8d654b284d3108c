import { Op, type Model, type ModelStatic, type Transaction } from 'sequelize';
import { UNDO_WINDOW_MS } from '@app/shared';
import { AppError, notFound } from '../../errors/app-error';
import {
  Comment,
  Listing,
  ListingReport,
  ModerationDecision,
  Notification,
  OutboxEmail,
  Post,
  Report,
  User,
  type DecisionNotices,
  type RowChange,
} from '../../models';
import type { AuditArea } from '../../models/audit-event.model';
import { recordAudit } from '../audit/audit.service';
import { refreshListing } from '../listings/listing-index';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { notify } from '../posts/notifications.service';
import { indexPost } from '../search/post-index';

type Kind = RowChange['kind'];
const MODELS: Record<Kind, ModelStatic<Model>> = {
  post: Post,
  comment: Comment,
  report: Report,
  listing: Listing,
  'listing-report': ListingReport,
};

/** Column values as JSON (dates tagged so they come back as dates). */
const toJson = (v: unknown): unknown =>
  v instanceof Date ? { $date: v.toISOString() } : (v ?? null);
const fromJson = (v: unknown): unknown =>
  v !== null && typeof v === 'object' && '$date' in v && typeof v.$date === 'string'
    ? new Date(v.$date)
    : v;
/** A canonical text of a value (object keys sorted), to compare a column now with what a decision left. */
function canon(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(canon).join(',')}]`;
  if (v !== null && typeof v === 'object')
    return `{${Object.keys(v)
      .sort()
      .map((k) => `${JSON.stringify(k)}:${canon((v as Record<string, unknown>)[k])}`)
      .join(',')}}`;
  return JSON.stringify(v ?? null);
}

/** Who a notice went to: the in-app notice and e-mail ids a decision queued. */
export interface Told {
  userId: number;
  notificationId?: number | null;
  emailId?: number | null;
}

/**
 * Collects what one decision changes, inside its transaction: `update()` instead of `row.update()` remembers
 * the columns' values before; `told()` remembers the notices; `save()` stores the decision for Undo.
 */
export class DecisionRecord {
  private rows = new Map<string, { kind: Kind; id: number; before: Record<string, unknown> }>();
  private notices: DecisionNotices = { notifications: [], emails: [], emailTo: [] };

  constructor(readonly transaction: Transaction) {}

  async update<M extends Model>(kind: Kind, row: M, values: Record<string, unknown>) {
    const id = Number(row.get('id'));
    const key = `${kind}:${id}`;
    const entry = this.rows.get(key) ?? { kind, id, before: {} };
    this.rows.set(key, entry);
    for (const f of Object.keys(values))
      if (!(f in entry.before)) entry.before[f] = toJson(row.get(f));
    await row.update(values, { transaction: this.transaction });
  }

  told(t: Told | null | undefined) {
    if (!t) return;
    if (t.notificationId) this.notices.notifications.push(t.notificationId);
    if (t.emailId) {
      this.notices.emails.push(t.emailId);
      this.notices.emailTo.push({ emailId: t.emailId, userId: t.userId });
    }
  }

  async save(
    actor: User,
    meta: {
      area: AuditArea;
      action: string;
      subjectType: string;
      subjectId: number;
      title: string;
      /** Where a correction links to (inside the app), e.g. /knowledge/12. */
      path: string | null;
    },
  ) {
    const { path, ...rest } = meta;
    const changes: RowChange[] = [];
    for (const e of this.rows.values()) {
      // Read back what the database holds (its date precision), so a later comparison is exact.
      const fresh = await MODELS[e.kind].findByPk(e.id, { transaction: this.transaction });
      const after: Record<string, unknown> = {};
      for (const f of Object.keys(e.before)) after[f] = toJson(fresh?.get(f));
      changes.push({ kind: e.kind, id: e.id, before: e.before, after });
    }
    return ModerationDecision.create(
      {
        actorId: actor.id,
        ...rest,
        title: meta.title.slice(0, 200),
        changes,
        notices: { ...this.notices, path },
        undoneAt: null,
        undoneById: null,
      },
      { transaction: this.transaction },
    );
  }
}

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
    if (d.actorId !== actor.id && !actor.hasRole('admin'))
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
