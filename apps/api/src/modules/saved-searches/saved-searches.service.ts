import { Op, UniqueConstraintError } from 'sequelize';
import type { SavedSearchCriteria } from '@app/shared';
import { AppError, notFound } from '../../errors/app-error';
import { withParentLocked } from '../../lib/serialize';
import { SavedSearch, SavedSearchHit, User, type Listing } from '../../models';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';

export const MAX_SAVED = 20;

/** The actor's saved searches, newest first. */
export const listSavedSearches = (actor: User) =>
  SavedSearch.findAll({ where: { userId: actor.id }, order: [['createdAt', 'DESC']] });

/** Saves a search (at most 20 per member). */
export async function createSavedSearch(actor: User, name: string, criteria: SavedSearchCriteria) {
  return withParentLocked(User, actor.id, async (transaction) => {
    if ((await SavedSearch.count({ where: { userId: actor.id }, transaction })) >= MAX_SAVED)
      throw new AppError('CONFLICT', `You can keep at most ${MAX_SAVED} saved searches`);
    return SavedSearch.create({ userId: actor.id, name, criteria }, { transaction });
  });
}

/** Deletes one of the actor's saved searches; anyone else's is not found. */
export async function deleteSavedSearch(actor: User, id: number) {
  const s = await SavedSearch.findByPk(id);
  if (!s || s.userId !== actor.id) throw notFound('Saved search');
  await s.destroy();
}

/**
 * E-mails each other member whose saved search matches a newly active listing, once per search and listing
 * (a unique hit row is the guard, so relisting or editing never repeats the e-mail). Each alert goes into the
 * outbox in the same transaction as its hit row, and the outbox sends it after commit.
 */
/** Whether listing `listingId` matches a saved search's criteria (the listing index answers it). */
export type CriteriaMatcher = (listingId: number, criteria: SavedSearchCriteria) => boolean;

export async function notifySavedSearches(
  ctx: { publicUrl: string },
  listing: Listing,
  matchesCriteria: CriteriaMatcher,
) {
  const searches = await SavedSearch.findAll({
    where: { userId: { [Op.ne]: listing.sellerId } },
    include: [{ model: User, as: 'user' }],
  });
  const sequelize = SavedSearch.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  let sent = 0;
  for (const s of searches) {
    if (!s.user || !matchesCriteria(listing.id, s.criteria)) continue;
    const user = s.user;
    const queued = await sequelize.transaction(async (transaction) => {
      try {
        await SavedSearchHit.create(
          { savedSearchId: s.id, listingId: listing.id },
          { transaction },
        );
      } catch (err) {
        if (err instanceof UniqueConstraintError) return false;
        throw err;
      }
      await enqueueEmail(alertOf(ctx, s, user, listing), transaction);
      return true;
    });
    if (queued) sent += 1;
  }
  return sent;
}

function alertOf(ctx: { publicUrl: string }, s: SavedSearch, user: User, listing: Listing) {
  return actionEmail({
    to: user.email,
    kind: 'saved-search-match',
    subject: `New on the exchange for “${s.name}”: ${listing.title}`,
    greeting: `Hello ${user.displayName},`,
    lines: [`A new listing matches your saved search “${s.name}”: ${listing.title}.`],
    actionLabel: 'See the listing',
    actionUrl: `${ctx.publicUrl}/exchange/listings/${listing.id}`,
    footer: 'You get one e-mail per new match. Delete the saved search to stop these e-mails.',
  });
}
