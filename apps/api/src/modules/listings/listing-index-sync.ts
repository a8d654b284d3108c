import type { Logger } from '../../logger';
import { catchUpListingIndex } from './listing-index';

/** How often each API process looks for listings other processes changed. */
export const LISTING_SYNC_INTERVAL_MS = 1_500;

/**
 * Polls MariaDB every `intervalMs` for listings changed since the index's watermark and applies them (one poll at
 * a time; a failed poll is logged and retried on the next tick). Returns a stop function. The timer is unref'd,
 * so it never keeps a process alive.
 */
export function startListingIndexSync(logger: Logger, intervalMs = LISTING_SYNC_INTERVAL_MS) {
  let running = false;
  const tick = () => {
    if (running) return;
    running = true;
    catchUpListingIndex()
      .then(
        (reread) => {
          if (reread) logger.debug({ reread }, 'listing index caught up');
        },
        (err: unknown) => logger.debug({ err }, 'listing index catch-up skipped'),
      )
      .finally(() => {
        running = false;
      });
  };
  const timer = setInterval(tick, intervalMs);
  timer.unref();
  return () => clearInterval(timer);
}
