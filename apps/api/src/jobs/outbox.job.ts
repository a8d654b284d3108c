import { acquireLease } from '../lib/job-lease';
import { drainOutbox } from '../modules/mail/outbox.service';
import type { Job } from './job';

/** How long the `outbox` lease lasts; the job renews it before each batch, so a dead sender is replaced this fast. */
export const OUTBOX_LEASE_MS = 15_000;

/**
 * Every `OUTBOX_INTERVAL_MS`: sends queued e-mails until the outbox is empty or a send fails. Errors (database or
 * SMTP down) are logged and retried. Only the process holding the `outbox` lease sends (on Galera, SKIP LOCKED
 * holds on one node only).
 */
export const outboxJob: Job = {
  name: 'outbox',
  everyMs: (env) => env.OUTBOX_INTERVAL_MS,
  firstAfterMs: 200,
  async tick({ env, sequelize, transport, logger }, isStopped) {
    try {
      let r;
      do {
        if (!(await acquireLease(sequelize, 'outbox', OUTBOX_LEASE_MS))) break;
        r = await drainOutbox(sequelize, transport, env.MAIL_FROM, logger);
      } while (!isStopped() && r.claimed > 0 && r.failed === 0);
    } catch (err) {
      logger.debug({ err }, 'outbox round skipped');
    }
  },
};
