import { describe, expect, it } from 'vitest';
import type { Role } from '@app/shared';
import { canAdministerClub, dropsOwnAdminRole } from './admin';
import { ownsBoat } from './boats';
import { canManageStormWatch, canUndoDecision } from './moderation';
import type { Actor } from './roles';
import { ownsTacklePlan } from './tackle-plans';
import { canOpenThreadOn, isThreadParty } from './threads';
import { canManageTreasury, ownsPayment } from './treasury';

const person = (id: number, ...roles: Role[]): Actor => ({ id, hasRole: (r) => roles.includes(r) });
const member = person(1, 'member');
const other = person(2, 'member');
const moderator = person(3, 'member', 'moderator');
const admin = person(4, 'member', 'admin');
const treasurer = person(5, 'member', 'treasurer');

describe('boats and tackle plans', () => {
  it('belong to their owner only, whatever the roles of anyone else', () => {
    for (const [owns, thing] of [
      [ownsBoat, { ownerId: 1 }],
      [ownsTacklePlan, { ownerId: 1 }],
    ] as const) {
      expect([member, other, moderator, admin].map((u) => owns(u, thing))).toEqual([
        true,
        false,
        false,
        false,
      ]);
    }
  });
});

describe('conversations', () => {
  it('are opened on someone else’s listing and read by buyer and seller only', () => {
    expect(canOpenThreadOn(member, { sellerId: member.id })).toBe(false);
    expect(canOpenThreadOn(member, { sellerId: other.id })).toBe(true);
    const thread = { buyerId: member.id, sellerId: other.id };
    expect([member, other, moderator, admin].map((u) => isThreadParty(u, thread))).toEqual([
      true,
      true,
      false,
      false,
    ]);
  });
});

describe('moderation, storm watches, treasury and admin', () => {
  it('lets the deciding moderator or any admin undo a decision', () => {
    const decision = { actorId: moderator.id };
    expect(canUndoDecision(moderator, decision)).toBe(true);
    expect(canUndoDecision(admin, decision)).toBe(true);
    expect(canUndoDecision(person(6, 'member', 'moderator'), decision)).toBe(false);
  });

  it('gives storm watches to moderators and admins, money to the treasurer, settings to admins', () => {
    const all = [member, moderator, admin, treasurer];
    expect(all.map(canManageStormWatch)).toEqual([false, true, true, false]);
    expect(all.map(canManageTreasury)).toEqual([false, false, false, true]);
    expect(all.map(canAdministerClub)).toEqual([false, false, true, false]);
  });

  it('keeps a checkout its member’s own', () => {
    expect([member, other, treasurer, admin].map((u) => ownsPayment(u, { userId: 1 }))).toEqual([
      true,
      false,
      false,
      false,
    ]);
  });

  it('stops an admin dropping their own admin role, not another admin’s', () => {
    expect(dropsOwnAdminRole(admin, admin.id, ['member'])).toBe(true);
    expect(dropsOwnAdminRole(admin, admin.id, ['member', 'admin'])).toBe(false);
    expect(dropsOwnAdminRole(admin, 9, ['member'])).toBe(false);
    expect(dropsOwnAdminRole(moderator, moderator.id, ['member'])).toBe(false);
  });
});
