import { runWithLease } from '../lib/job-lease';
import { sendNotificationDigests } from '../modules/posts/notification-digest';
import type { Job } from './job';

const EVERY_MS = 3_600_000;

/**
 * Hourly: the daily e-mail of unread notices for members who opted in (each member at most once per 23 hours).
 * The `notification-digest` lease makes one process of a cluster run each round.
 */
export const notificationDigestJob: Job = {
  name: 'notification-digest',
  everyMs: () => EVERY_MS,
  firstAfterMs: 15_000,
  async tick({ env, sequelize, logger }) {
    const ctx = { publicUrl: env.PUBLIC_URL, secret: env.SESSION_SECRET };
    try {
      const r = await runWithLease(sequelize, 'notification-digest', EVERY_MS * 0.9, () =>
        sendNotificationDigests(ctx),
      );
      if (r.ran && r.result.sent) logger.info(r.result, 'notification digests queued');
    } catch (err) {
      logger.debug({ err }, 'digest round skipped');
    }
  },
};
