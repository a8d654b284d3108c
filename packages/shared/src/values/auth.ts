// Roles, unit systems and the password and name limits, without the schemas: the web app's first load reads these.
export const ROLES = ['member', 'moderator', 'treasurer', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const UNIT_SYSTEMS = ['imperial', 'metric'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

/** bcrypt reads only a password's first 72 bytes (UTF-8): longer ones are refused rather than cut short. */
export const PASSWORD_MAX_BYTES = 72;

/**
 * Characters a reader cannot see but that change what they see: control characters (C0, DEL, C1), line and
 * paragraph separators, zero-width spaces and the byte-order mark, and the bidirectional marks, embeddings,
 * overrides and isolates (Unicode UAX #9) that can make a name read as someone else's.
 */
export const HIDDEN_CHARACTERS =
  /[\p{Cc}\u061C\u200B\u200E\u200F\u2028-\u202E\u2060\u2066-\u2069\uFEFF]/u;
