import type { Actor } from './roles';

/** A buyer opens a conversation on someone else's listing, never on their own. */
export const canOpenThreadOn = (buyer: Actor, listing: { sellerId: number }) =>
  listing.sellerId !== buyer.id;

/** Only the buyer and the seller read or write in a conversation. */
export const isThreadParty = (user: Actor, thread: { buyerId: number; sellerId: number }) =>
  thread.buyerId === user.id || thread.sellerId === user.id;
