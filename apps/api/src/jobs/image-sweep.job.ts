import { runWithLease } from '../lib/job-lease';
import { sweepUnusedImages } from '../modules/uploads/image-quota';
import type { Job } from './job';

const EVERY_MS = 3_600_000;

/**
 * Hourly: deletes post images that no saved post shows after the grace period. The `image-sweep` lease makes one
 * process of a cluster sweep per interval.
 */
export const imageSweepJob: Job = {
  name: 'image-sweep',
  everyMs: () => EVERY_MS,
  firstAfterMs: 30_000,
  async tick({ sequelize, logger }) {
    try {
      const r = await runWithLease(sequelize, 'image-sweep', EVERY_MS * 0.9, () =>
        sweepUnusedImages(),
      );
      if (r.ran && (r.result.removed || r.result.kept))
        logger.info(r.result, 'unused images swept');
    } catch (err) {
      logger.debug({ err }, 'image sweep skipped');
    }
  },
};
