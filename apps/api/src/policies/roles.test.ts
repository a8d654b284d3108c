import { describe, expect, it } from 'vitest';
import type { Role } from '@app/shared';
import {
  hasModeratorRole,
  isAdmin,
  isModeratorOrAdmin,
  isTreasurer,
  ROLES_ADMIN,
  ROLES_MODERATOR,
  ROLES_MODERATOR_OR_ADMIN,
  ROLES_TREASURER,
  type Actor,
} from './roles';

const ROLES: Role[] = ['member', 'moderator', 'treasurer', 'admin'];
const holding = (...roles: Role[]): Actor => ({ id: 7, hasRole: (r) => roles.includes(r) });

describe('role rules', () => {
  // Which single role passes each rule; a visitor passes none.
  it.each([
    ['hasModeratorRole', hasModeratorRole, ['moderator']],
    ['isModeratorOrAdmin', isModeratorOrAdmin, ['moderator', 'admin']],
    ['isAdmin', isAdmin, ['admin']],
    ['isTreasurer', isTreasurer, ['treasurer']],
  ] as const)('%s lets through exactly %j', (_name, rule, passing) => {
    expect(ROLES.filter((r) => rule(holding(r)))).toEqual(passing);
    expect(rule(null)).toBe(false);
    expect(rule(undefined)).toBe(false);
    expect(rule(holding())).toBe(false);
  });

  it('counts an admin who is also a moderator as a moderator', () => {
    expect(hasModeratorRole(holding('admin', 'moderator'))).toBe(true);
    expect(hasModeratorRole(holding('admin', 'treasurer'))).toBe(false);
  });

  it.each([
    ['ROLES_MODERATOR', ROLES_MODERATOR, hasModeratorRole],
    ['ROLES_MODERATOR_OR_ADMIN', ROLES_MODERATOR_OR_ADMIN, isModeratorOrAdmin],
    ['ROLES_ADMIN', ROLES_ADMIN, isAdmin],
    ['ROLES_TREASURER', ROLES_TREASURER, isTreasurer],
  ] as const)('%s (the route check) agrees with its rule', (_name, list, rule) => {
    for (const r of ROLES) expect(list.includes(r), r).toBe(rule(holding(r)));
  });
});
