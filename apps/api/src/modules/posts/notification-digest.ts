import { createHmac, timingSafeEqual } from 'node:crypto';
import { Op } from 'sequelize';
import { invalid } from '../../errors/app-error';
import { Notification, User } from '../../models';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { countOf, pluralWord } from '@app/shared';

export interface DigestContext {
  publicUrl: string;
  /** Signs the stop links in digest e-mails (the session secret). */
  secret: string;
}

/**
 * A member gets at most one digest per 23 hours: the job runs hourly, so a daily rhythm never drifts later by an
 * hour each day.
 */
export const DIGEST_MIN_GAP_MS = 23 * 3_600_000;
/** The notices listed in one e-mail; the rest are counted ("and 4 more"). */
export const DIGEST_MAX_LISTED = 15;

const sign = (userId: number, secret: string) =>
  createHmac('sha256', secret).update(`digest-stop:${userId}`).digest('base64url').slice(0, 32);

/** The token in a digest's stop link: the member id and an HMAC of it, so the link works without signing in. */
export const digestStopToken = (userId: number, secret: string) =>
  `${userId}.${sign(userId, secret)}`;

/** The member a stop token names, or null when the token was not made with `secret`. */
export function userIdFromStopToken(token: string, secret: string): number | null {
  const m = /^([1-9]\d{0,9})\.([A-Za-z0-9_-]{32})$/.exec(token);
  if (!m?.[1] || !m[2]) return null;
  const userId = Number(m[1]);
  const given = Buffer.from(m[2]);
  const expected = Buffer.from(sign(userId, secret));
  return given.length === expected.length && timingSafeEqual(given, expected) ? userId : null;
}

/** Turns the digest off for the member a stop link names. Stopping twice is fine; a forged link is a 400. */
export async function stopDigestByToken(ctx: DigestContext, token: string) {
  const userId = userIdFromStopToken(token, ctx.secret);
  const user = userId === null ? null : await User.findByPk(userId);
  if (!user)
    throw invalid(
      {
        token:
          'This link is not valid: use the link in your newest digest e-mail, or turn the digest off on your account page',
      },
      'This stop link is not valid',
    );
  if (user.digestOptIn) await user.update({ digestOptIn: false });
}

function digestEmail(ctx: DigestContext, user: User, unread: Notification[]) {
  const listed = unread.slice(-DIGEST_MAX_LISTED).reverse();
  const more = unread.length - listed.length;
  const n = unread.length;
  return actionEmail({
    to: user.email,
    kind: 'notification-digest',
    subject: `Rodewise: ${countOf(n, 'unread notice', 'unread notices')}`,
    greeting: `Hello ${user.displayName},`,
    lines: [
      `Here ${pluralWord(n, 'is what', `are the ${countOf(n, 'notice', 'notices')} that`)} came in since your last digest and ${pluralWord(n, 'is', 'are')} still unread:`,
      ...listed.map((x) => `• ${x.message}${x.link ? ` — ${ctx.publicUrl}${x.link}` : ''}`),
      ...(more > 0 ? [`…and ${countOf(more, 'older notice', 'older notices')}.`] : []),
    ],
    actionLabel: 'Open your notices',
    actionUrl: `${ctx.publicUrl}/notifications`,
    footer:
      'You asked for this daily digest. It comes at most once a day, and only when something is unread. You can turn it off on your account page.',
    footerLink: {
      label: 'Stop the daily digest',
      url: `${ctx.publicUrl}/notices/stop-digest?token=${digestStopToken(user.id, ctx.secret)}`,
    },
  });
}

/**
 * Mails each opted-in member, whose last digest is at least 23 hours old, the notices that came in since their
 * watermark and are still unread, then moves the watermark past them. Read notices move the watermark without a
 * mail. The watermark update is conditional on its old value, so when several processes run the job at once only
 * one of them mails a member, and a notice is never mailed twice.
 */
export async function sendNotificationDigests(ctx: DigestContext, at = new Date()) {
  const sequelize = User.sequelize;
  if (!sequelize) throw new Error('models are not initialised');
  const users = await User.findAll({
    where: {
      digestOptIn: true,
      [Op.or]: [
        { digestSentAt: null },
        { digestSentAt: { [Op.lte]: new Date(at.getTime() - DIGEST_MIN_GAP_MS) } },
      ],
    },
    order: [['id', 'ASC']],
  });
  let sent = 0;
  for (const user of users) {
    const notices = await Notification.findAll({
      where: {
        userId: user.id,
        id: { [Op.gt]: user.digestThroughId ?? 0 },
        createdAt: { [Op.lte]: at },
      },
      order: [['id', 'ASC']],
    });
    const last = notices.at(-1);
    if (!last) continue;
    const unread = notices.filter((x) => x.readAt === null);
    const mailed = await sequelize.transaction(async (transaction) => {
      const [count] = await User.update(
        {
          digestThroughId: last.id,
          ...(unread.length > 0 ? { digestSentAt: at } : {}),
        },
        {
          where: { id: user.id, digestOptIn: true, digestThroughId: user.digestThroughId ?? null },
          transaction,
        },
      );
      if (count === 0 || unread.length === 0) return false;
      await enqueueEmail(digestEmail(ctx, user, unread), transaction);
      return true;
    });
    if (mailed) sent += 1;
  }
  return { sent, considered: users.length };
}
