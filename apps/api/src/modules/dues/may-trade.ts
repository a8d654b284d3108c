import { AppError } from '../../errors/app-error';
import type { User } from '../../models';
import { getSetting } from '../club/club.service';
import { isPaidUp } from './paid-up';

const PAID_UP_NEEDED = {
  list: 'The club asks for a paid-up membership before gear is listed. Pay your dues, then publish; your draft is kept.',
  message:
    'The club asks for a paid-up membership before members message sellers. Pay your dues on the Dues page, then send your message again.',
} as const;

/**
 * Throws FORBIDDEN when the club's trading policy (`listingRequiresPaidUp`, an admin setting) is on and the actor
 * is not paid up: it covers publishing a listing and opening a conversation with a seller.
 */
export async function assertMayTrade(
  actor: User,
  action: keyof typeof PAID_UP_NEEDED,
  at = new Date(),
) {
  if (!(await getSetting('listingRequiresPaidUp'))) return;
  if (!(await isPaidUp(actor.id, at))) throw new AppError('FORBIDDEN', PAID_UP_NEEDED[action]);
}
