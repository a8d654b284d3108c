import { Op } from 'sequelize';
import type { SellerDto } from '@app/shared';
import { notFound } from '../../errors/app-error';
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
import { membershipPaidUp } from '../dues/paid-up';
import { canEditListing, canSeeListing } from '../../policies/listings';

export interface ExchangeContext {
  publicUrl: string;
  /** Where a failed saved-search alert round is reported (it never fails the seller's request). */
  logger?: Logger;
}

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

/** A listing's page inside the client, for in-app notices. */
export const listingPath = (id: number) => `/exchange/listings/${id}`;

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
