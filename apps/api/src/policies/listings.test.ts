import { describe, expect, it } from 'vitest';
import type { ListingStatus, Role } from '@app/shared';
import { canEditListing, canReportListing, canSeeListing, isOnExchange } from './listings';
import type { Actor } from './roles';

const person = (id: number, ...roles: Role[]): Actor => ({ id, hasRole: (r) => roles.includes(r) });
const seller = person(1, 'member');
const buyer = person(2, 'member');
const moderator = person(3, 'member', 'moderator');
const admin = person(4, 'member', 'admin');
const treasurer = person(5, 'member', 'treasurer');
const listing = (status: ListingStatus, hiddenAt: Date | null = null) => ({
  sellerId: seller.id,
  status,
  hiddenAt,
});

describe('canSeeListing', () => {
  it.each([
    // status, hidden, visitor, seller, buyer, moderator, admin, treasurer
    ['active', false, true, true, true, true, true, true],
    ['sold', false, true, true, true, true, true, true],
    ['active', true, false, true, false, true, true, false],
    ['draft', false, false, true, false, true, true, false],
    ['expired', false, false, true, false, true, true, false],
    ['withdrawn', false, false, true, false, true, true, false],
  ] as const)('%s listing (hidden: %s)', (status, hidden, ...expected) => {
    const l = listing(status, hidden ? new Date() : null);
    expect(isOnExchange(l)).toBe(expected[0]);
    expect(
      [null, seller, buyer, moderator, admin, treasurer].map((u) => canSeeListing(u, l)),
    ).toEqual(expected);
  });
});

describe('listing rules', () => {
  it('lets only the seller change a listing, and only others report it', () => {
    const l = listing('active');
    expect([seller, buyer, moderator, admin].map((u) => canEditListing(u, l))).toEqual([
      true,
      false,
      false,
      false,
    ]);
    expect([seller, buyer, moderator].map((u) => canReportListing(u, l))).toEqual([
      false,
      true,
      true,
    ]);
  });
});
