import { Op, UniqueConstraintError } from 'sequelize';
import type { SavedSearchCriteria } from '@app/shared';
import { AppError, notFound } from '../../errors/app-error';
import { SavedSearch, SavedSearchHit, User, type Listing } from '../../models';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { matchesCriteria } from '../listings/listing-index';

const MAX_SAVED = 20;

/** The actor's saved searches, newest first. */
export const listSavedSearches = (actor: User) =>
  SavedSearch.findAll({ where: { userId: actor.id }, order: [['createdAt', 'DESC']] });

/** Saves a search (at most 20 per member). */
export async function createSavedSearch(actor: User, name: string, criteria: SavedSearchCriteria) {
  if ((await SavedSearch.count({ where: { userId: actor.id } })) >= MAX_SAVED)
    throw new AppError('CONFLICT', `You can keep at most ${MAX_SAVED} saved searches`);
  return SavedSearch.create({ userId: actor.id, name, criteria });
}

/** Deletes one of the actor's saved searches; anyone else's is not found. */
export async function deleteSavedSearch(actor: User, id: number) {
  const s = await SavedSearch.findByPk(id);
  if (!s || s.userId !== actor.id) throw notFound('Saved search');
  await s.destroy();
}

/**
 * E-mails each other member whose saved search matches a newly active listing, once per search and listing
 * (a unique hit row is the guard, so relisting or editing never repeats the e-mail).
 */
export async function notifySavedSearches(ctx: { publicUrl: string }, listing: Listing) {
  const searches = await SavedSearch.findAll({
    where: { userId: { [Op.ne]: listing.sellerId } },
    include: [{ model: User, as: 'user' }],
  });
  let sent = 0;
  for (const s of searches) {
    if (!s.user || !matchesCriteria(listing.id, s.criteria)) continue;
    try {
      await SavedSearchHit.create({ savedSearchId: s.id, listingId: listing.id });
    } catch (err) {
      if (err instanceof UniqueConstraintError) continue;
      throw err;
    }
    await enqueueEmail(
      actionEmail({
        to: s.user.email,
        kind: 'saved-search-match',
        subject: `New on the exchange for “${s.name}”: ${listing.title}`,
        greeting: `Hello ${s.user.displayName},`,
        lines: [`A new listing matches your saved search “${s.name}”: ${listing.title}.`],
        actionLabel: 'See the listing',
        actionUrl: `${ctx.publicUrl}/exchange/listings/${listing.id}`,
        footer: 'You get one e-mail per new match. Delete the saved search to stop these e-mails.',
      }),
    );
    sent += 1;
  }
  return sent;
}
