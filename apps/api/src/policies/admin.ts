import type { Role } from '@app/shared';
import { isAdmin, type Actor } from './roles';

/** Roles and club settings are changed by admins. */
export const canAdministerClub = (user: Actor) => isAdmin(user);

/** An admin may not drop their own admin role, so a club is never left without one by accident. */
export const dropsOwnAdminRole = (actor: Actor, userId: number, roles: readonly Role[]) =>
  actor.id === userId && isAdmin(actor) && !roles.includes('admin');
