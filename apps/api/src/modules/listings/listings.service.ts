import { Op } from 'sequelize';
import type { InferAttributes } from 'sequelize';
import { LISTING_LIFETIME_DAYS, type ListingStatus } from '@app/shared';
import { AppError, invalid } from '../../errors/app-error';
import { Harbor, Listing, ListingThread, type User } from '../../models';
import { assertMayTrade } from '../dues/may-trade';
import { notify } from '../posts/notifications.service';
import { notifySavedSearches } from '../saved-searches/saved-searches.service';
import { matchesCriteria, refreshListing } from './listing-index';
import { getOwnListing, listingPath, type ExchangeContext } from './listing-reads.service';
import { checkSpecs, sizeMmOf, type ParsedListing } from './listing-specs';

const DAY_MS = 86_400_000;
const expiryFrom = (at: Date) => new Date(at.getTime() + LISTING_LIFETIME_DAYS * DAY_MS);

/** Throws FORBIDDEN when the club requires a paid-up membership to list and the actor is not paid up. */
export const assertMayList = (actor: User, at = new Date()) => assertMayTrade(actor, 'list', at);

async function checkHarbor(id: number) {
  if (!(await Harbor.findByPk(id))) throw invalid({ harborId: 'Choose one of the club harbours' });
}

function fieldsOf(input: ParsedListing) {
  return {
    category: input.category,
    title: input.title,
    description: input.description,
    specs: input.specs as Record<string, unknown>,
    condition: input.condition,
    priceCents: input.priceCents,
    currency: input.currency,
    harborId: input.harborId,
    sizeMm: sizeMmOf(input.category, input.specs),
  };
}

/**
 * After the listing went live (its row is committed): refresh the index, then queue the saved-search alerts in
 * the outbox. The listing is live whatever happens to the alerts, so a failure there is logged and the seller's
 * request still succeeds; each alert is queued with its hit row in one transaction, so a later relist or edit
 * sends the ones that were missed and never repeats one.
 */
async function afterActivated(ctx: ExchangeContext, listing: Listing) {
  await refreshListing(listing.id);
  try {
    await notifySavedSearches(ctx, listing, matchesCriteria);
  } catch (err) {
    ctx.logger?.error({ err, listingId: listing.id }, 'saved-search alerts not queued');
  }
}

/** The states a seller's change starts from, and what they read when the listing is in another. */
interface Move {
  from: readonly ListingStatus[];
  message: string;
}
const MOVES = {
  edit: {
    from: ['draft', 'active', 'expired', 'withdrawn'],
    message: 'A sold listing cannot be edited',
  },
  publish: {
    from: ['draft'],
    message: 'Only a draft can be published; use relist for the others',
  },
  relist: {
    from: ['sold', 'expired', 'withdrawn'],
    message: 'Only a sold, expired or withdrawn listing can be relisted',
  },
  withdraw: {
    from: ['draft', 'active'],
    message: 'Only a draft or active listing can be withdrawn',
  },
} as const satisfies Record<string, Move>;

/** Throws CONFLICT (with the move's message) unless the listing is in one of the move's starting states. */
function assertCanMove(listing: Listing, move: Move) {
  if (!move.from.includes(listing.status)) throw new AppError('CONFLICT', move.message);
}

/**
 * Moves a listing from one of the move's states to the new state with one conditional UPDATE, so two concurrent
 * changes (sold and withdraw, say) cannot both apply: the loser gets CONFLICT and the row keeps the winner's state.
 */
async function transition(
  listing: Listing,
  move: Move,
  changes: Partial<InferAttributes<Listing>>,
) {
  const [affected] = await Listing.update(changes, {
    where: { id: listing.id, status: { [Op.in]: move.from } },
  });
  if (affected === 0) throw new AppError('CONFLICT', move.message);
  await listing.reload();
  return listing;
}

/** Creates a draft, or publishes at once when `publish` (paid-up policy applies). Throws VALIDATION_FAILED per field. */
export async function createListing(
  ctx: ExchangeContext,
  actor: User,
  input: ParsedListing,
  opts: { publish: boolean; at?: Date },
) {
  const at = opts.at ?? new Date();
  checkSpecs(input);
  await checkHarbor(input.harborId);
  if (opts.publish) await assertMayList(actor, at);
  const listing = await Listing.create({
    ...fieldsOf(input),
    sellerId: actor.id,
    status: opts.publish ? 'active' : 'draft',
    publishedAt: opts.publish ? at : null,
    expiresAt: opts.publish ? expiryFrom(at) : null,
    soldAt: null,
    soldThreadId: null,
    hiddenAt: null,
    hiddenReason: null,
  });
  if (opts.publish) await afterActivated(ctx, listing);
  return listing;
}

/** Replaces the seller's own listing's fields (not once sold). */
export async function updateListing(actor: User, id: number, input: ParsedListing) {
  const listing = await getOwnListing(actor, id);
  assertCanMove(listing, MOVES.edit);
  checkSpecs(input);
  await checkHarbor(input.harborId);
  await transition(listing, MOVES.edit, fieldsOf(input));
  await refreshListing(id);
  return listing;
}

/** Draft → active for 60 days. */
export async function publishListing(
  ctx: ExchangeContext,
  actor: User,
  id: number,
  at = new Date(),
) {
  const listing = await getOwnListing(actor, id);
  assertCanMove(listing, MOVES.publish);
  await assertMayList(actor, at);
  await transition(listing, MOVES.publish, {
    status: 'active',
    publishedAt: at,
    expiresAt: expiryFrom(at),
  });
  await afterActivated(ctx, listing);
  return listing;
}

/** Sold, expired or withdrawn → active again for 60 days from `at`. */
export async function relistListing(
  ctx: ExchangeContext,
  actor: User,
  id: number,
  at = new Date(),
) {
  const listing = await getOwnListing(actor, id);
  assertCanMove(listing, MOVES.relist);
  await assertMayList(actor, at);
  const soldThreadId = listing.status === 'sold' ? listing.soldThreadId : null;
  await transition(listing, MOVES.relist, {
    status: 'active',
    publishedAt: at,
    expiresAt: expiryFrom(at),
    soldAt: null,
    soldThreadId: null,
  });
  const soldThread = soldThreadId === null ? null : await ListingThread.findByPk(soldThreadId);
  if (soldThread)
    await notify(
      soldThread.buyerId,
      'listing-sale-undone',
      `${actor.displayName} put “${listing.title}” back on the exchange: it is no longer marked sold to you.`,
      listingPath(id),
    );
  await afterActivated(ctx, listing);
  return listing;
}

/** Takes a draft or active listing off the exchange. */
export async function withdrawListing(actor: User, id: number) {
  const listing = await getOwnListing(actor, id);
  assertCanMove(listing, MOVES.withdraw);
  await transition(listing, MOVES.withdraw, { status: 'withdrawn' });
  await refreshListing(id);
  return listing;
}
