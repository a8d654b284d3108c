import type { ListingStatus } from '@app/shared';
import { isModeratorOrAdmin, type Actor } from './roles';

interface ListingLike {
  sellerId: number;
  status: ListingStatus;
  hiddenAt: Date | null;
}

/** The listing's seller. */
export const isSeller = (user: Actor | null | undefined, listing: Pick<ListingLike, 'sellerId'>) =>
  !!user && listing.sellerId === user.id;

/** Active and sold listings that no moderator hid are on the exchange for everyone. */
export const isOnExchange = (listing: Pick<ListingLike, 'status' | 'hiddenAt'>) =>
  (listing.status === 'active' || listing.status === 'sold') && listing.hiddenAt === null;

/** Everyone sees what is on the exchange; the seller, moderators and admins see the rest too. */
export const canSeeListing = (user: Actor | null, listing: ListingLike) =>
  isOnExchange(listing) || isSeller(user, listing) || isModeratorOrAdmin(user);

/** Only the seller edits, publishes, relists, withdraws or marks sold, and adds photos. */
export const canEditListing = (user: Actor, listing: Pick<ListingLike, 'sellerId'>) =>
  isSeller(user, listing);

/** A member reports someone else's listing, never their own. */
export const canReportListing = (user: Actor, listing: Pick<ListingLike, 'sellerId'>) =>
  !isSeller(user, listing);
