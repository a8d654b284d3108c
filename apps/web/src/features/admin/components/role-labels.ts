import type { Role } from '@app/shared';

/** How each role is named on screen. */
export const ROLE_LABELS: Record<Role, string> = {
  member: 'Member',
  moderator: 'Moderator',
  treasurer: 'Treasurer',
  admin: 'Admin',
};
