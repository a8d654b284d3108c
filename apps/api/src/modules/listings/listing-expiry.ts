import { Listing, User } from '../../models';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { refreshListing } from './listing-index';
import { dueForExpiry, type ExchangeContext } from './listing-reads.service';

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
