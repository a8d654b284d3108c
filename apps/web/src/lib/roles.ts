import type { Role, UserDto } from '@app/shared';

// The glossary's role words, as the API's policies (apps/api/src/policies/roles.ts) use them.

/** The person holds `role` itself. */
export const hasRole = (user: UserDto | null | undefined, role: Role): user is UserDto =>
  !!user && user.roles.includes(role);

/** The moderator role itself (not an admin without it). */
export const hasModeratorRole = (user: UserDto | null | undefined): user is UserDto =>
  hasRole(user, 'moderator');

/** What a moderator may do, admins may too: storm watches and the moderation desks on the server. */
export const isModeratorOrAdmin = (user: UserDto | null | undefined): user is UserDto =>
  hasRole(user, 'moderator') || hasRole(user, 'admin');
