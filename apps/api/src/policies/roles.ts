import type { Role } from '@app/shared';

/** What a policy needs of a person: an id and their roles (a `User` model fits, so does a plain object). */
export interface Actor {
  id: number;
  hasRole(role: Role): boolean;
}

/** Who may pass a role check: `null` or `undefined` is a visitor. */
export type Viewer = Actor | null | undefined;

/**
 * Holds the moderator role itself. Admins do not count: the post queue, its publish-at-once rule and the
 * listing-report and hide routes are the moderators' alone.
 */
export const hasModeratorRole = (user: Viewer): user is Actor =>
  !!user && user.hasRole('moderator');

/** A moderator or an admin: sees hidden listings, runs storm watches, may undo a moderation decision. */
export const isModeratorOrAdmin = (user: Viewer): user is Actor =>
  !!user && (user.hasRole('moderator') || user.hasRole('admin'));

/** Holds the admin role. */
export const isAdmin = (user: Viewer): user is Actor => !!user && user.hasRole('admin');

/** Holds the treasurer role (admins do not count: money is the treasurer's). */
export const isTreasurer = (user: Viewer): user is Actor => !!user && user.hasRole('treasurer');

/** The roles a route check (`requireRole(...)`) lets through, one list per rule above. */
export const ROLES_MODERATOR: readonly Role[] = ['moderator'];
export const ROLES_MODERATOR_OR_ADMIN: readonly Role[] = ['moderator', 'admin'];
export const ROLES_ADMIN: readonly Role[] = ['admin'];
export const ROLES_TREASURER: readonly Role[] = ['treasurer'];
