import type { Model, ModelStatic, Transaction } from 'sequelize';
import {
  Comment,
  Listing,
  ListingReport,
  ModerationDecision,
  Post,
  Report,
  type DecisionNotices,
  type RowChange,
  type User,
} from '../../models';
import type { AuditArea } from '../../models/audit-event.model';

type Kind = RowChange['kind'];
export const MODELS: Record<Kind, ModelStatic<Model>> = {
  post: Post,
  comment: Comment,
  report: Report,
  listing: Listing,
  'listing-report': ListingReport,
};

/** Column values as JSON (dates tagged so they come back as dates). */
export const toJson = (v: unknown): unknown =>
  v instanceof Date ? { $date: v.toISOString() } : (v ?? null);
export const fromJson = (v: unknown): unknown =>
  v !== null && typeof v === 'object' && '$date' in v && typeof v.$date === 'string'
    ? new Date(v.$date)
    : v;
/** A canonical text of a value (object keys sorted), to compare a column now with what a decision left. */
export function canon(v: unknown): string {
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
