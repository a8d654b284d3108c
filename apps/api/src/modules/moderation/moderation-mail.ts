import type { Transaction } from 'sequelize';
import { User } from '../../models';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { notify } from '../posts/notifications.service';
import type { Told } from '../audit/decision-record';

export interface OutcomeNotice {
  userId: number;
  subject: string;
  lines: string[];
  /** Path inside the app, e.g. /knowledge/12 */
  path: string;
}

/**
 * Tells the author of a moderated post or comment by e-mail (via the outbox) and in the app; answers the ids
 * of both, so an undo can withdraw them.
 */
export async function tellAuthor(
  publicUrl: string,
  n: OutcomeNotice,
  transaction?: Transaction,
): Promise<Told | null> {
  const user = await User.findByPk(n.userId, { transaction });
  if (!user) return null;
  const email = await enqueueEmail(
    actionEmail({
      to: user.email,
      kind: 'moderation',
      subject: n.subject,
      greeting: `Hello ${user.displayName},`,
      lines: n.lines,
      actionLabel: 'Open it',
      actionUrl: `${publicUrl}${n.path}`,
      footer: 'You get this e-mail because you wrote this on Rodewise.',
    }),
    transaction,
  );
  const notice = await notify(user.id, 'moderation', n.subject, n.path, transaction);
  return { userId: user.id, notificationId: notice.id, emailId: email.id };
}
