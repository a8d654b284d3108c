import { AppError, invalid } from '../../errors/app-error';
import { Listing, ListingThread, User } from '../../models';
import { actionEmail } from '../mail/templates';
import { enqueueEmail } from '../mail/outbox.service';
import { notify } from '../posts/notifications.service';
import { refreshListing } from './listing-index';
import {
  getOwnListing,
  listingPath,
  listingUrl,
  type ExchangeContext,
} from './listing-reads.service';

/**
 * Active → sold, to the buyer of one of the listing's conversations (`threadId`) or to someone else (none). One
 * transaction holds the conditional UPDATE (the loser of a race gets CONFLICT and nobody is told anything) and
 * the notices: the buyer gets an in-app notice and an e-mail through the outbox, every other member who wrote
 * about the listing an in-app notice that it is sold (their conversations close; the buyer's stays open for the
 * hand-over).
 */
export async function markSold(
  ctx: ExchangeContext,
  actor: User,
  id: number,
  threadId: number | undefined,
  at = new Date(),
) {
  const listing = await getOwnListing(actor, id);
  if (listing.status !== 'active')
    throw new AppError('CONFLICT', 'Only an active listing can be marked sold');
  const threads = await ListingThread.findAll({ where: { listingId: id } });
  let buyer: User | null = null;
  if (threadId !== undefined) {
    const thread = threads.find((t) => t.id === threadId);
    if (!thread) throw invalid({ threadId: 'Choose one of this listing’s conversations' });
    buyer = await User.findByPk(thread.buyerId);
  }
  const sequelize = Listing.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  const message = 'Only an active listing can be marked sold';
  await sequelize.transaction(async (transaction) => {
    const [affected] = await Listing.update(
      { status: 'sold', soldAt: at, soldThreadId: threadId ?? null },
      { where: { id, status: 'active' }, transaction },
    );
    if (affected === 0) throw new AppError('CONFLICT', message);
    if (buyer) {
      await notify(
        buyer.id,
        'listing-sold-to-you',
        `${actor.displayName} marked “${listing.title}” as sold to you. Arrange the hand-over in your conversation.`,
        listingPath(id),
        transaction,
      );
      await enqueueEmail(
        actionEmail({
          to: buyer.email,
          kind: 'listing-sold-to-you',
          subject: `Sold to you: ${listing.title}`,
          greeting: `Hello ${buyer.displayName},`,
          lines: [
            `${actor.displayName} has marked “${listing.title}” as sold to you.`,
            'Arrange hand-over in your conversation. Inspect used gear before you rely on it.',
            'If this is a mistake, write to the seller: they can put the listing back on the exchange.',
          ],
          actionLabel: 'Open the listing',
          actionUrl: listingUrl(ctx, id),
        }),
        transaction,
      );
    }
    const others = [...new Set(threads.map((t) => t.buyerId))].filter((b) => b !== buyer?.id);
    for (const other of others)
      await notify(
        other,
        'listing-sold',
        `“${listing.title}”, which you asked about, has been sold.`,
        listingPath(id),
        transaction,
      );
  });
  await listing.reload();
  await refreshListing(id);
  return listing;
}
