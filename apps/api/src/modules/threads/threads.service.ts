import { Op, type Transaction } from 'sequelize';
import type { MessageDto, ThreadDto, ThreadSummaryDto } from '@app/shared';
import { AppError, notFound } from '../../errors/app-error';
import { Listing, ListingMessage, ListingThread, User } from '../../models';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { assertMayTrade } from '../dues/may-trade';
import { canOpenThreadOn, isThreadParty } from '../../policies/threads';

const PREVIEW = 140;

async function emailOtherParty(
  publicUrl: string,
  thread: ListingThread,
  listing: Listing,
  sender: User,
  body: string,
  transaction: Transaction,
) {
  const toId = sender.id === thread.buyerId ? thread.sellerId : thread.buyerId;
  const to = await User.findByPk(toId, { transaction });
  if (!to) return;
  await enqueueEmail(
    actionEmail({
      to: to.email,
      kind: 'listing-message',
      subject: `New message about ${listing.title}`,
      greeting: `Hello ${to.displayName},`,
      lines: [`${sender.displayName} wrote:`, body.length > 600 ? `${body.slice(0, 600)}…` : body],
      actionLabel: 'Reply in Rodewise',
      actionUrl: `${publicUrl}/messages/${thread.id}`,
      footer:
        'Meet in the harbour or pay through a method you trust; never send money to someone you have not met.',
    }),
    transaction,
  );
}

/** Runs the writes of one message (thread, message row, outbox mail) as one transaction: all land or none. */
function inTransaction<T>(work: (t: Transaction) => Promise<T>): Promise<T> {
  const sequelize = ListingMessage.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  return sequelize.transaction(work);
}

/**
 * A buyer writes to the seller about an active listing: opens the buyer's thread (or reuses it) and adds the
 * message; the seller is e-mailed. Sellers cannot open threads on their own listings, and under the club's
 * paid-up policy only a paid-up buyer can write (FORBIDDEN).
 */
export async function openThread(publicUrl: string, buyer: User, listingId: number, body: string) {
  const listing = await Listing.findByPk(listingId);
  if (!listing || listing.hiddenAt !== null || listing.status !== 'active')
    throw notFound('Listing');
  if (!canOpenThreadOn(buyer, listing))
    throw new AppError('CONFLICT', 'This is your own listing: buyers start the conversation');
  await assertMayTrade(buyer, 'message');
  const now = new Date();
  return inTransaction(async (transaction) => {
    const [thread] = await ListingThread.findOrCreate({
      where: { listingId, buyerId: buyer.id },
      defaults: {
        listingId,
        buyerId: buyer.id,
        sellerId: listing.sellerId,
        lastMessageAt: now,
        buyerReadAt: now,
        sellerReadAt: null,
      },
      transaction,
    });
    await ListingMessage.create({ threadId: thread.id, senderId: buyer.id, body }, { transaction });
    await thread.update({ lastMessageAt: now, buyerReadAt: now }, { transaction });
    await emailOtherParty(publicUrl, thread, listing, buyer, body, transaction);
    return thread;
  });
}

/** One thread the actor takes part in; anyone else's is not found. */
export async function getOwnThread(actor: User, id: number): Promise<ListingThread> {
  const thread = await ListingThread.findByPk(id, {
    include: [
      { model: Listing, as: 'listing' },
      { model: User, as: 'buyer' },
      { model: User, as: 'seller' },
    ],
  });
  if (!thread || !isThreadParty(actor, thread)) throw notFound('Conversation');
  return thread;
}

/**
 * Adds a reply to a thread the actor takes part in and e-mails the other party. The rules for opening a
 * conversation hold for every reply too: the listing must be on the exchange (active and not hidden, or sold
 * through this very conversation, for the hand-over), and under the club's paid-up policy the writer must be
 * paid up.
 */
export async function reply(publicUrl: string, actor: User, id: number, body: string) {
  const thread = await getOwnThread(actor, id);
  const listing = thread.listing;
  if (!listing) throw notFound('Listing');
  const open =
    listing.hiddenAt === null &&
    (listing.status === 'active' ||
      (listing.status === 'sold' && listing.soldThreadId === thread.id));
  if (!open)
    throw new AppError(
      'CONFLICT',
      listing.hiddenAt !== null
        ? 'A moderator has taken this listing off the exchange, so the conversation is closed'
        : `This listing is ${listing.status}, so the conversation is closed`,
    );
  await assertMayTrade(actor, 'message');
  const now = new Date();
  return inTransaction(async (transaction) => {
    const message = await ListingMessage.create(
      { threadId: id, senderId: actor.id, body },
      { transaction },
    );
    await thread.update(
      {
        lastMessageAt: now,
        ...(actor.id === thread.buyerId ? { buyerReadAt: now } : { sellerReadAt: now }),
      },
      { transaction },
    );
    await emailOtherParty(publicUrl, thread, listing, actor, body, transaction);
    return message;
  });
}

async function unreadCounts(actor: User, threads: ListingThread[]) {
  const out = new Map<number, number>();
  for (const t of threads) {
    const readAt = actor.id === t.buyerId ? t.buyerReadAt : t.sellerReadAt;
    out.set(
      t.id,
      await ListingMessage.count({
        where: {
          threadId: t.id,
          senderId: { [Op.ne]: actor.id },
          ...(readAt ? { createdAt: { [Op.gt]: readAt } } : {}),
        },
      }),
    );
  }
  return out;
}

function summary(actor: User, t: ListingThread, last: ListingMessage | null, unread: number) {
  const role = actor.id === t.buyerId ? 'buyer' : 'seller';
  const other = role === 'buyer' ? t.seller : t.buyer;
  return {
    id: t.id,
    listingId: t.listingId,
    listingTitle: t.listing?.title ?? '',
    listingStatus: t.listing?.status ?? 'withdrawn',
    otherParty: { id: other?.id ?? 0, displayName: other?.displayName ?? 'Former member' },
    role,
    lastMessage: last ? last.body.slice(0, PREVIEW) : '',
    lastMessageAt: t.lastMessageAt.toISOString(),
    unread,
    soldToThisThread: t.listing?.soldThreadId === t.id,
  } satisfies ThreadSummaryDto;
}

/** The actor's inbox: threads as buyer or seller, most recent first, with unread counts. */
export async function inbox(actor: User): Promise<ThreadSummaryDto[]> {
  const threads = await ListingThread.findAll({
    where: { [Op.or]: [{ buyerId: actor.id }, { sellerId: actor.id }] },
    include: [
      { model: Listing, as: 'listing' },
      { model: User, as: 'buyer' },
      { model: User, as: 'seller' },
    ],
    order: [['lastMessageAt', 'DESC']],
    limit: 200,
  });
  const unread = await unreadCounts(actor, threads);
  const out: ThreadSummaryDto[] = [];
  for (const t of threads) {
    const last = await ListingMessage.findOne({
      where: { threadId: t.id },
      order: [['id', 'DESC']],
    });
    out.push(summary(actor, t, last, unread.get(t.id) ?? 0));
  }
  return out;
}

/** Unread messages across the actor's threads (for the nav badge). */
export async function unreadTotal(actor: User): Promise<number> {
  const threads = await ListingThread.findAll({
    where: { [Op.or]: [{ buyerId: actor.id }, { sellerId: actor.id }] },
  });
  let total = 0;
  for (const n of (await unreadCounts(actor, threads)).values()) total += n;
  return total;
}

/** A thread with its messages; marks it read for the actor. */
export async function readThread(actor: User, id: number): Promise<ThreadDto> {
  const thread = await getOwnThread(actor, id);
  const messages = await ListingMessage.findAll({
    where: { threadId: id },
    order: [['id', 'ASC']],
  });
  const unread = (await unreadCounts(actor, [thread])).get(id) ?? 0;
  await thread.update(
    actor.id === thread.buyerId ? { buyerReadAt: new Date() } : { sellerReadAt: new Date() },
  );
  return {
    ...summary(actor, thread, messages[messages.length - 1] ?? null, unread),
    messages: messages.map((m): MessageDto => ({
      id: m.id,
      senderId: m.senderId,
      mine: m.senderId === actor.id,
      body: m.body,
      createdAt: m.createdAt.toISOString(),
    })),
  };
}

/** The threads on one of the seller's listings (to pick a buyer when marking sold). */
export async function threadsOfListing(actor: User, listingId: number) {
  const all = await inbox(actor);
  return all.filter((t) => t.listingId === listingId && t.role === 'seller');
}
