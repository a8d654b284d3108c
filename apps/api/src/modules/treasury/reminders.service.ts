import type { Sequelize } from 'sequelize';
import type { ReminderPreviewDto } from '@app/shared';
import { DUES_STATUS_LABELS } from '@app/shared';
import { formatDate, formatMoney } from '@app/shared/locale';
import type { Env } from '../../config/env';
import type { User } from '../../models';
import { recordAudit } from '../audit/audit.service';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { roster } from './roster.service';

const SUBJECT = 'Your club dues are due';
type Row = Awaited<ReturnType<typeof roster>>[number];

function reminderFor(row: Row, publicUrl: string) {
  const owed = formatMoney(row.owedMinor, row.currency ?? 'EUR');
  return actionEmail({
    to: row.email,
    kind: 'dues-reminder',
    subject: SUBJECT,
    greeting: `Hello ${row.displayName},`,
    lines: [
      row.paidThrough
        ? `Your ${row.planName ?? ''} dues were paid through ${formatDate(row.paidThrough)}; your membership now shows as ${DUES_STATUS_LABELS[row.status ?? 'due'].toLowerCase()}.`
        : `Your ${row.planName ?? ''} membership has no dues paid yet.`,
      `Amount owed now: ${owed}. You can pay by card in about a minute, or hand a cheque or cash to the treasurer.`,
    ],
    actionLabel: 'Pay your dues',
    actionUrl: `${publicUrl}/dues`,
    footer: 'If you have paid in the last few days, thank you, and please ignore this reminder.',
  });
}

/** Who of `userIds` would get a reminder (due or overdue members who owe something), and the message they get. */
export async function previewReminders(userIds: number[], env: Env): Promise<ReminderPreviewDto> {
  const rows = await roster();
  const wanted = new Set(userIds);
  const recipients: ReminderPreviewDto['recipients'] = [];
  const skipped: ReminderPreviewDto['skipped'] = [];
  const byId = new Map(rows.map((r) => [r.userId, r]));
  for (const id of wanted) {
    const r = byId.get(id);
    if (!r) skipped.push({ userId: id, reason: 'Not a member' });
    else if (!r.status || !r.currency)
      skipped.push({ userId: id, reason: 'Has no membership plan' });
    else if (r.status !== 'due' && r.status !== 'overdue')
      skipped.push({
        userId: id,
        reason: `Status is ${DUES_STATUS_LABELS[r.status].toLowerCase()}`,
      });
    else if (r.owedMinor <= 0) skipped.push({ userId: id, reason: 'Owes nothing' });
    else
      recipients.push({
        userId: r.userId,
        displayName: r.displayName,
        email: r.email,
        status: r.status,
        owedMinor: r.owedMinor,
        currency: r.currency,
      });
  }
  const first = recipients[0] && byId.get(recipients[0].userId);
  return {
    recipients,
    skipped,
    subject: SUBJECT,
    sampleText: first ? reminderFor(first, env.PUBLIC_URL).text : '',
  };
}

/** Queues one reminder per eligible member through the outbox, in one transaction, and logs the batch. */
export async function sendReminders(
  actor: User,
  userIds: number[],
  deps: { sequelize: Sequelize; env: Env },
) {
  const preview = await previewReminders(userIds, deps.env);
  const rows = new Map((await roster()).map((r) => [r.userId, r]));
  await deps.sequelize.transaction(async (t) => {
    for (const rcpt of preview.recipients) {
      const row = rows.get(rcpt.userId);
      if (row) await enqueueEmail(reminderFor(row, deps.env.PUBLIC_URL), t);
    }
    await recordAudit(
      {
        actorId: actor.id,
        area: 'treasury',
        action: 'reminders.send',
        subjectType: 'reminder_batch',
        details: {
          sent: preview.recipients.map((r) => r.userId),
          skipped: preview.skipped,
        },
      },
      t,
    );
  });
  return { sent: preview.recipients.length, skipped: preview.skipped };
}
