import type { Transaction } from 'sequelize';
import { User } from '../../models';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { notify } from '../posts/notifications.service';

export interface OutcomeNotice {
  userId: number;
  subject: string;
  lines: string[];
  /** Path inside the app, e.g. /knowledge/12 */
  path: string;
}

/** Tells the author of a moderated post or comment by e-mail (via the outbox) and in the app. */
export async function tellAuthor(publicUrl: string, n: OutcomeNotice, transaction?: Transaction) {
  const user = await User.findByPk(n.userId, { transaction });
  if (!user) return;
  await enqueueEmail(
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
  await notify(user.id, 'moderation', n.subject, n.path, transaction);
}
