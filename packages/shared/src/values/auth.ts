// Zod-free values for the auth area (re-exported by ../auth.ts); nothing here may import zod.
export const ROLES = ['member', 'moderator', 'treasurer', 'admin'] as const;
export type Role = (typeof ROLES)[number];
export const UNIT_SYSTEMS = ['imperial', 'metric'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];
