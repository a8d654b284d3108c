import { Op } from 'sequelize';
import type { InferAttributes } from 'sequelize';
import { LISTING_LIFETIME_DAYS, type ListingStatus, type SellerDto } from '@app/shared';
import { AppError, invalid, notFound } from '../../errors/app-error';
import {
  Harbor,
  Listing,
  ListingPhoto,
  ListingThread,
  Membership,
  MembershipPlan,
  User,
} from '../../models';
import type { Logger } from '../../logger';
import { assertMayTrade } from '../dues/may-trade';
import { membershipPaidUp } from '../dues/paid-up';
import { actionEmail } from '../mail/templates';
import { enqueueEmail } from '../mail/outbox.service';
import { notify } from '../posts/notifications.service';
import { notifySavedSearches } from '../saved-searches/saved-searches.service';
import { matchesCriteria, refreshListing } from './listing-index';
import { checkSpecs, sizeMmOf, type ParsedListing } from './listing-specs';
import { canEditListing, canSeeListing } from '../../policies/listings';

export interface ExchangeContext {
  publicUrl: string;
  /** Where a failed saved-search alert round is reported (it never fails the seller's request). */
  logger?: Logger;
}

const DAY_MS = 86_400_000;
const expiryFrom = (at: Date) => new Date(at.getTime() + LISTING_LIFETIME_DAYS * DAY_MS);
export const listingUrl = (ctx: ExchangeContext, id: number) =>
  `${ctx.publicUrl}/exchange/listings/${id}`;

const LISTING_INCLUDE = [
  { model: Harbor, as: 'harbor' },
  { model: ListingPhoto, as: 'photos' },
];

/** Loads a listing with harbour and photos, or null. */
export const loadListing = (id: number) => Listing.findByPk(id, { include: LISTING_INCLUDE });

/** The seller with their membership and its plan: everything the seller card needs, in the same joined query. */
const sellerInclude = {
  model: User,
  as: 'seller',
  include: [
    { model: Membership, as: 'membership', include: [{ model: MembershipPlan, as: 'plan' }] },
  ],
};

/**
 * Seller card from a user loaded with `membership.plan` (see sellerInclude). Whether the seller's dues are
 * paid is club business: only signed-in viewers get it.
 */
function sellerDtoOf(user: User, at: Date, signedIn: boolean): SellerDto {
  // Loaded through the User.hasOne(Membership, { as: 'membership' }) association.
  const membership = (user as User & { membership?: Membership | null }).membership ?? null;
  return {
    id: user.id,
    displayName: user.displayName,
    memberSince: membership?.joinedOn ?? user.createdAt.toISOString().slice(0, 10),
    ...(signedIn ? { paidUp: membershipPaidUp(membership, at) } : {}),
  };
}

/**
 * A listing page as `viewer` may see it (visibility as getVisibleListing) with its seller card, read in one
 * joined query: listing, harbour, photos, seller, the seller's membership and its plan.
 */
export async function getVisibleListingPage(
  viewer: User | null,
  id: number,
  at = new Date(),
): Promise<{ listing: Listing; seller: SellerDto }> {
  const listing = await Listing.findByPk(id, { include: [...LISTING_INCLUDE, sellerInclude] });
  if (!listing) throw notFound('Listing');
  assertVisible(viewer, listing);
  if (!listing.seller) throw notFound('Seller');
  return { listing, seller: sellerDtoOf(listing.seller, at, viewer !== null) };
}

function assertVisible(viewer: User | null, listing: Listing) {
  if (!canSeeListing(viewer, listing)) throw notFound('Listing');
}

/** The actor's own listing; anyone else's is reported as not found. */
export async function getOwnListing(actor: User, id: number): Promise<Listing> {
  const listing = await loadListing(id);
  if (!listing || !canEditListing(actor, listing)) throw notFound('Listing');
  return listing;
}

/**
 * A listing as `viewer` may see it: active or sold and not hidden for everyone; drafts, expired, withdrawn and
 * hidden ones only for the seller and moderators (404 otherwise).
 */
export async function getVisibleListing(viewer: User | null, id: number): Promise<Listing> {
  const listing = await loadListing(id);
  if (!listing) throw notFound('Listing');
  assertVisible(viewer, listing);
  return listing;
}

/**
 * The member a sold listing went to, for the seller and that buyer only (undefined for everyone else, and when
 * it was sold outside the club's conversations).
 */
export async function soldToFor(
  viewer: User | null,
  listing: Listing,
): Promise<{ displayName: string; isMe: boolean } | undefined> {
  if (!viewer || listing.status !== 'sold' || listing.soldThreadId === null) return undefined;
  const thread = await ListingThread.findByPk(listing.soldThreadId, {
    include: [{ model: User, as: 'buyer' }],
  });
  if (!thread || (viewer.id !== listing.sellerId && viewer.id !== thread.buyerId)) return undefined;
  return {
    displayName: thread.buyer?.displayName ?? 'Former member',
    isMe: viewer.id === thread.buyerId,
  };
}

/** Seller card: display name, member since (membership join date, else sign-up) and the paid-up badge. */
export async function sellerOf(sellerId: number, at = new Date()): Promise<SellerDto> {
  const user = await User.findByPk(sellerId, { include: sellerInclude.include });
  if (!user) throw notFound('Seller');
  return sellerDtoOf(user, at, true);
}

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

/**
 * Moves a listing from one of `from` to the new state with one conditional UPDATE, so two concurrent changes
 * (sold and withdraw, say) cannot both apply: the loser gets CONFLICT and the row keeps the winner's state.
 */
async function transition(
  listing: Listing,
  from: readonly ListingStatus[],
  changes: Partial<InferAttributes<Listing>>,
  message: string,
) {
  const [affected] = await Listing.update(changes, {
    where: { id: listing.id, status: { [Op.in]: from } },
  });
  if (affected === 0) throw new AppError('CONFLICT', message);
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
  if (listing.status === 'sold') throw new AppError('CONFLICT', 'A sold listing cannot be edited');
  checkSpecs(input);
  await checkHarbor(input.harborId);
  await transition(
    listing,
    ['draft', 'active', 'expired', 'withdrawn'],
    fieldsOf(input),
    'A sold listing cannot be edited',
  );
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
  if (listing.status !== 'draft')
    throw new AppError('CONFLICT', 'Only a draft can be published; use relist for the others');
  await assertMayList(actor, at);
  await transition(
    listing,
    ['draft'],
    { status: 'active', publishedAt: at, expiresAt: expiryFrom(at) },
    'Only a draft can be published; use relist for the others',
  );
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
  if (!['sold', 'expired', 'withdrawn'].includes(listing.status))
    throw new AppError('CONFLICT', 'Only a sold, expired or withdrawn listing can be relisted');
  await assertMayList(actor, at);
  const soldThreadId = listing.status === 'sold' ? listing.soldThreadId : null;
  await transition(
    listing,
    ['sold', 'expired', 'withdrawn'],
    {
      status: 'active',
      publishedAt: at,
      expiresAt: expiryFrom(at),
      soldAt: null,
      soldThreadId: null,
    },
    'Only a sold, expired or withdrawn listing can be relisted',
  );
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
  if (!['draft', 'active'].includes(listing.status))
    throw new AppError('CONFLICT', 'Only a draft or active listing can be withdrawn');
  await transition(
    listing,
    ['draft', 'active'],
    { status: 'withdrawn' },
    'Only a draft or active listing can be withdrawn',
  );
  await refreshListing(id);
  return listing;
}

/** A listing's page inside the client, for in-app notices. */
const listingPath = (id: number) => `/exchange/listings/${id}`;

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

/** The actor's listings of every status, newest first. */
export const listMine = (actor: User) =>
  Listing.findAll({
    where: { sellerId: actor.id },
    include: [
      { model: Harbor, as: 'harbor' },
      { model: ListingPhoto, as: 'photos' },
    ],
    order: [['updatedAt', 'DESC']],
  });

/** Active listings whose `expiresAt` has passed by `at`. */
export const dueForExpiry = (at: Date) =>
  Listing.findAll({ where: { status: 'active', expiresAt: { [Op.lte]: at } }, limit: 500 });
