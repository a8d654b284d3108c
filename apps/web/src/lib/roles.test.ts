import { describe, expect, it } from 'vitest';
import { buildUser } from '@/testing/builders';
import { hasModeratorRole, hasRole, isModeratorOrAdmin } from './roles';

describe('role words', () => {
  it('tells the moderator role from moderator-or-admin', () => {
    const admin = buildUser({ roles: ['member', 'admin'] });
    const moderator = buildUser({ roles: ['member', 'moderator'] });
    const member = buildUser({ roles: ['member'] });
    expect([admin, moderator, member].map(hasModeratorRole)).toEqual([false, true, false]);
    expect([admin, moderator, member].map(isModeratorOrAdmin)).toEqual([true, true, false]);
    expect(hasRole(null, 'member')).toBe(false);
    expect(isModeratorOrAdmin(undefined)).toBe(false);
  });
});
