import { imageSweepJob } from './image-sweep.job';
import type { Job } from './job';
import { listingExpiryJob } from './listing-expiry.job';
import { listingIndexSyncJob } from './listing-index-sync.job';
import { notificationDigestJob } from './notification-digest.job';
import { outboxJob } from './outbox.job';

/** Every timed job of the API; `startJobs()` runs them all (server start only, never in tests). */
export const JOBS: readonly Job[] = [
  outboxJob,
  listingExpiryJob,
  listingIndexSyncJob,
  notificationDigestJob,
  imageSweepJob,
];
