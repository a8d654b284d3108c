import { runWithLease } from '../../lib/job-lease';
import type { Logger } from '../../logger';
import { Listing, User } from '../../models';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { refreshListing } from './listing-index';
import { dueForExpiry, type ExchangeContext } from './listings.service';

/**
 * Expires every active listing whose 60 days have run out by `at` and queues a renewal e-mail to its seller.
 * Safe to run from several processes: a row is expired (and mailed) only by the update that changed it.
 */
export async function sweepExpiredListings(ctx: ExchangeContext, at = new Date()) {
  const due = await dueForExpiry(at);
  let expired = 0;
  for (const listing of due) {
    const changed = await listing.sequelize.transaction(async (transaction) => {
      const [count] = await Listing.update(
        { status: 'expired' },
        { where: { id: listing.id, status: 'active' }, transaction },
      );
      if (count === 0) return false;
      const seller = await User.findByPk(listing.sellerId, { transaction });
      if (seller)
        await enqueueEmail(
          actionEmail({
            to: seller.email,
            kind: 'listing-expired',
            subject: `Renew your listing: ${listing.title}`,
            greeting: `Hello ${seller.displayName},`,
            lines: [
              `“${listing.title}” has been on the exchange for 60 days and is now expired, so it no longer shows in search.`,
              'Still for sale? Relist it for another 60 days with one click.',
            ],
            actionLabel: 'Relist it',
            actionUrl: `${ctx.publicUrl}/exchange/mine`,
            footer: 'Sold it elsewhere? You can ignore this e-mail.',
          }),
          transaction,
        );
      return true;
    });
    if (changed) {
      expired += 1;
      await refreshListing(listing.id);
    }
  }
  return { expired };
}

/**
 * Runs the sweep every `intervalMs` (default hourly); returns a stop function. Errors are logged and retried.
 * The `listing-expiry` lease makes one process of a cluster sweep per interval.
 */
export function startListingSweeper(ctx: ExchangeContext, logger: Logger, intervalMs = 3_600_000) {
  const tick = () => {
    const db = Listing.sequelize;
    if (!db) return;
    runWithLease(db, 'listing-expiry', intervalMs * 0.9, () => sweepExpiredListings(ctx)).then(
      (r) => {
        if (r.ran && r.result.expired) logger.info(r.result, 'listings expired');
      },
      (err: unknown) => logger.debug({ err }, 'listing sweep skipped'),
    );
  };
  const timer = setInterval(tick, intervalMs);
  timer.unref();
  const first = setTimeout(tick, 5_000);
  first.unref();
  return () => {
    clearInterval(timer);
    clearTimeout(first);
  };
}
