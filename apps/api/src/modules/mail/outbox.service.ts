import nodemailer, { type Transporter } from 'nodemailer';
import { Op, type Sequelize, type Transaction } from 'sequelize';
import type { Env } from '../../config/env';
import type { Logger } from '../../logger';
import { OutboxEmail } from '../../models';

export interface OutgoingEmail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  kind: string;
}

/** The `outbox_emails.subject` column's width, in characters. */
export const SUBJECT_MAX = 200;

/**
 * A subject that fits the column: line breaks become spaces (a header is one line) and a long one is cut on a
 * whole character (never inside a surrogate pair or a combining sequence) with an ellipsis.
 */
export function clipSubject(subject: string, max = SUBJECT_MAX): string {
  const oneLine = subject.replace(/[\r\n\t]+/g, ' ').trim();
  const chars = Array.from(
    new Intl.Segmenter('en', { granularity: 'grapheme' }).segment(oneLine),
    (g) => g.segment,
  );
  if (Array.from(oneLine).length <= max) return oneLine;
  let out = '';
  for (const g of chars) {
    if (Array.from(out + g).length > max - 1) break;
    out += g;
  }
  return `${out.trimEnd()}…`;
}

/** Stores a message in the outbox (inside the caller's transaction when given); the worker sends it. */
export async function enqueueEmail(
  mail: OutgoingEmail,
  transaction?: Transaction,
): Promise<OutboxEmail> {
  return OutboxEmail.create(
    {
      toAddress: mail.to,
      subject: clipSubject(mail.subject),
      textBody: mail.text,
      htmlBody: mail.html ?? null,
      kind: mail.kind,
      lockedUntil: null,
      lastError: null,
      sentAt: null,
    },
    { transaction },
  );
}

const CONNECTION_TIMEOUT_MS = 3000;
const GREETING_TIMEOUT_MS = 3000;
const SOCKET_TIMEOUT_MS = 5000;

export function createTransport(env: Env): Transporter {
  return nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: false,
    ignoreTLS: true,
    connectionTimeout: CONNECTION_TIMEOUT_MS,
    greetingTimeout: GREETING_TIMEOUT_MS,
    socketTimeout: SOCKET_TIMEOUT_MS,
  });
}

/** Backoff after `attempts` failures: 2 s, 4 s, 8 s … capped at 5 minutes. */
export const backoffMs = (attempts: number) =>
  Math.min(300_000, 2000 * 2 ** Math.max(0, attempts - 1));

/**
 * The longest one message may take: connecting, the greeting, then the SMTP exchange (MAIL, RCPT, DATA and the
 * body, each step allowed the socket timeout of silence; three of them counted) and the row update afterwards.
 */
export const SEND_BUDGET_MS =
  CONNECTION_TIMEOUT_MS + GREETING_TIMEOUT_MS + 3 * SOCKET_TIMEOUT_MS + 2000;
/** Messages claimed per round. */
export const ROUND_SIZE = 10;
/**
 * How long a claim lasts: longer than the worst-case round (every message taking its whole budget) plus a
 * margin, so another API process never takes over a row this one may still send. A row is only ever sent
 * while at least one full budget is left on its claim (see drainOutbox), which makes this hold even when a
 * round runs slow; a process that dies mid-round leaves its rows to the others when the claim runs out.
 */
export const LEASE_MS = ROUND_SIZE * SEND_BUDGET_MS + 30_000;

/** Kinds whose body carries a single-use sign-in-grade link (verification, password reset). */
export const TOKEN_MAIL_KINDS: ReadonlySet<string> = new Set(['verify-email', 'password-reset']);
/** What such a row's body becomes once sent: the outbox keeps no usable link in clear. */
export const REDACTED_BODY = '[Removed after sending: this message carried a single-use link.]';

/**
 * Claims due messages with SELECT … FOR UPDATE SKIP LOCKED (so several API processes never send the same row),
 * sends them, and records the outcome. Returns how many were sent and how many failed this round.
 */
export async function drainOutbox(
  sequelize: Sequelize,
  transport: Transporter,
  from: string,
  logger?: Logger,
  limit = ROUND_SIZE,
) {
  const now = new Date();
  const leaseEnds = now.getTime() + LEASE_MS;
  const claimed = await sequelize.transaction(async (t) => {
    const rows = await OutboxEmail.findAll({
      where: {
        status: { [Op.in]: ['pending', 'sending'] },
        nextAttemptAt: { [Op.lte]: now },
        [Op.or]: [{ lockedUntil: null }, { lockedUntil: { [Op.lt]: now } }],
      },
      order: [['id', 'ASC']],
      limit,
      lock: t.LOCK.UPDATE,
      skipLocked: true,
      transaction: t,
    });
    if (rows.length) {
      await OutboxEmail.update(
        { status: 'sending', lockedUntil: new Date(leaseEnds) },
        { where: { id: rows.map((r) => r.id) }, transaction: t },
      );
    }
    return rows;
  });
  let sent = 0;
  let failed = 0;
  for (const [i, row] of claimed.entries()) {
    if (Date.now() + SEND_BUDGET_MS > leaseEnds) {
      // Too little of the claim is left to send one more safely: hand the rest back unsent.
      await OutboxEmail.update(
        { status: 'pending', lockedUntil: null },
        { where: { id: claimed.slice(i).map((r) => r.id), status: 'sending' } },
      );
      logger?.warn({ released: claimed.length - i }, 'outbox round ran long; rest released');
      break;
    }
    try {
      await transport.sendMail({
        from,
        to: row.toAddress,
        subject: row.subject,
        text: row.textBody,
        html: row.htmlBody ?? undefined,
        messageId: `<outbox-${row.id}@rodewise.local>`,
      });
      // Static updates by id: the instance still holds the pre-claim status, so instance.update() would skip it.
      const redact = TOKEN_MAIL_KINDS.has(row.kind);
      await OutboxEmail.update(
        {
          status: 'sent',
          sentAt: new Date(),
          lockedUntil: null,
          attempts: row.attempts + 1,
          lastError: null,
          ...(redact ? { textBody: REDACTED_BODY, htmlBody: null } : {}),
        },
        { where: { id: row.id } },
      );
      sent += 1;
    } catch (err) {
      const attempts = row.attempts + 1;
      const message = err instanceof Error ? err.message : String(err);
      await OutboxEmail.update(
        {
          status: attempts >= 50 ? 'failed' : 'pending',
          attempts,
          lockedUntil: null,
          lastError: message.slice(0, 500),
          nextAttemptAt: new Date(Date.now() + backoffMs(attempts)),
        },
        { where: { id: row.id } },
      );
      logger?.warn({ outboxId: row.id, attempts, err: message }, 'mail not sent; will retry');
      failed += 1;
    }
  }
  return { sent, failed, claimed: claimed.length };
}
