import { Membership, MembershipPlan } from '../../models';
import { paidUpOn, toIsoDate } from './calendar';

/**
 * True when the member's dues cover `at` (default now): they have a paid-through date and `at` falls on or
 * before it plus their plan's grace period. A member with no membership, or who never paid, is not paid up.
 */
export async function isPaidUp(userId: number, at: Date = new Date()): Promise<boolean> {
  const membership = await Membership.findOne({
    where: { userId },
    include: [{ model: MembershipPlan, as: 'plan' }],
  });
  return membershipPaidUp(membership, at);
}

/** The same rule for a membership already loaded with its `plan` (e.g. inside a joined query). */
export function membershipPaidUp(membership: Membership | null, at: Date = new Date()): boolean {
  if (!membership) return false;
  return paidUpOn(membership.paidThrough, membership.plan?.graceDays ?? 0, toIsoDate(at));
}
