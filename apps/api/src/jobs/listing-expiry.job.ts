import { runWithLease } from '../lib/job-lease';
import { sweepExpiredListings } from '../modules/listings/listing-expiry';
import type { Job } from './job';

const EVERY_MS = 3_600_000;

/**
 * Hourly: expires listings whose 60 days have run out and mails their sellers. The `listing-expiry` lease makes
 * one process of a cluster sweep per interval.
 */
export const listingExpiryJob: Job = {
  name: 'listing-expiry',
  everyMs: () => EVERY_MS,
  firstAfterMs: 5_000,
  async tick({ env, sequelize, logger }) {
    const ctx = { publicUrl: env.PUBLIC_URL, logger };
    try {
      const r = await runWithLease(sequelize, 'listing-expiry', EVERY_MS * 0.9, () =>
        sweepExpiredListings(ctx),
      );
      if (r.ran && r.result.expired) logger.info(r.result, 'listings expired');
    } catch (err) {
      logger.debug({ err }, 'listing sweep skipped');
    }
  },
};
