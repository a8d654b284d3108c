import { clearOnWrites } from './lib/clear-on-writes';
import {
  Boat,
  ClubSetting,
  Comment,
  Harbor,
  Listing,
  ListingPhoto,
  Membership,
  MembershipPlan,
  Post,
  Topic,
  User,
  Vote,
} from './models';
import { clearClubCache } from './modules/club/club-cache';
import { clearAnonymousListingCache } from './modules/listings/listing-read-cache';
import { clearAnonymousPostCache } from './modules/posts/post-read-cache';

interface ReadCache {
  /** Names the model hooks, so installing again (each test app does) replaces them. */
  name: string;
  /** Every model whose rows the cached answer shows: a write to any of them empties the cache. */
  models: readonly unknown[];
  clear: () => void;
}

/** The per-process read caches and what each one shows. */
const READ_CACHES: readonly ReadCache[] = [
  // The club's settings and harbours (GET /api/club, the locale in every page).
  { name: 'club-cache', models: [ClubSetting, Harbor], clear: clearClubCache },
  // A post page as a visitor sees it: posts, comments, votes, topics, authors, boats.
  {
    name: 'anonymous-post-cache',
    models: [Post, Comment, Vote, Topic, User, Boat],
    clear: clearAnonymousPostCache,
  },
  // A listing page as a visitor sees it: listings, photos, harbours, sellers, and what decides the paid-up badge
  // (memberships and their plans' grace days).
  {
    name: 'anonymous-listing-cache',
    models: [Listing, ListingPhoto, Harbor, User, Membership, MembershipPlan],
    clear: clearAnonymousListingCache,
  },
];

/** Empties each read cache after any write to what it shows (models must be initialised first). */
export function installReadCaches() {
  for (const c of READ_CACHES) clearOnWrites(c.models, c.name, c.clear);
}

/** Empties every read cache now (TRUNCATE runs no model hooks, so tests call this after emptying tables). */
export function clearReadCaches() {
  for (const c of READ_CACHES) c.clear();
}
