import { catchUpListingIndex } from '../modules/listings/listing-index';
import type { Job } from './job';

/** How often each API process looks for listings other processes changed. */
export const LISTING_SYNC_INTERVAL_MS = 1_500;

/**
 * Every 1.5 s, in every process: applies listings changed since the index's watermark, so listings written by
 * other API processes on the same database reach this process's search index within a poll or two.
 */
export const listingIndexSyncJob: Job = {
  name: 'listing-index-sync',
  everyMs: () => LISTING_SYNC_INTERVAL_MS,
  firstAfterMs: LISTING_SYNC_INTERVAL_MS,
  async tick({ logger }) {
    try {
      const reread = await catchUpListingIndex();
      if (reread) logger.debug({ reread }, 'listing index caught up');
    } catch (err) {
      logger.debug({ err }, 'listing index catch-up skipped');
    }
  },
};
