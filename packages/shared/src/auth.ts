import { z } from 'zod';
import {
  HIDDEN_CHARACTERS,
  PASSWORD_MAX_BYTES,
  ROLES,
  UNIT_SYSTEMS,
  type Role,
  type UnitSystem,
} from './values/auth';

export * from './values/auth';

export const roleSchema = z.enum(ROLES);

const email = z
  .string({ error: 'E-mail is required' })
  .trim()
  .toLowerCase()
  .min(1, 'E-mail is required')
  .max(254, 'E-mail is too long')
  .pipe(z.email('Enter a valid e-mail address'));

const utf8Bytes = (s: string) => new TextEncoder().encode(s).length;

/** Password rules shared by sign-up, reset and change. */
export const passwordSchema = z
  .string({ error: 'Password is required' })
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 72 characters')
  .refine((v) => utf8Bytes(v) <= PASSWORD_MAX_BYTES, {
    message: 'Use at most 72 characters (accented letters and symbols count as two to four)',
  });

export const signupSchema = z.object({
  email,
  password: passwordSchema,
  displayName: z
    .string({ error: 'Name is required' })
    .trim()
    .min(2, 'Name needs at least 2 characters')
    .max(80, 'Name is too long')
    .refine((v) => !HIDDEN_CHARACTERS.test(v), {
      message:
        'Use letters, digits, spaces and punctuation only (no control or text-direction characters)',
    }),
});
export type SignupInput = z.infer<typeof signupSchema>;

export const loginSchema = z.object({
  email,
  password: z.string({ error: 'Password is required' }).min(1, 'Password is required').max(200),
});
export type LoginInput = z.infer<typeof loginSchema>;

export const tokenSchema = z.object({
  token: z.string({ error: 'Token is required' }).min(20, 'The link is incomplete').max(200),
});
export type TokenInput = z.infer<typeof tokenSchema>;

export const resetRequestSchema = z.object({ email });
export type ResetRequestInput = z.infer<typeof resetRequestSchema>;

export const resetConfirmSchema = tokenSchema.extend({ password: passwordSchema });
export type ResetConfirmInput = z.infer<typeof resetConfirmSchema>;

export const updateAccountSchema = z
  .object({
    displayName: signupSchema.shape.displayName.optional(),
    unitSystem: z.enum(UNIT_SYSTEMS).optional(),
    /** Opt in to (true) or out of (false) the daily e-mail of unread notices. */
    notificationDigest: z.boolean({ error: 'Choose on or off' }).optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
export type UpdateAccountInput = z.infer<typeof updateAccountSchema>;

/** POST /api/account/digest/stop: the signed token from a digest e-mail's stop link (no sign-in needed). */
export const stopDigestSchema = z.object({
  token: z
    .string({ error: 'The link is missing its token' })
    .min(10, 'This link is not complete: copy the whole link from the e-mail')
    .max(200, 'This link is not valid'),
});
export type StopDigestInput = z.infer<typeof stopDigestSchema>;

export const changePasswordSchema = z.object({
  currentPassword: z
    .string({ error: 'Current password is required' })
    .min(1, 'Current password is required'),
  newPassword: passwordSchema,
});
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

export const setRolesSchema = z.object({
  roles: z
    .array(roleSchema)
    .max(ROLES.length)
    .transform((r) => [...new Set(r)]),
});
export type SetRolesInput = z.infer<typeof setRolesSchema>;

export const userListQuerySchema = z.object({
  q: z.string().trim().max(100).optional(),
});

export interface UserDto {
  id: number;
  email: string;
  displayName: string;
  roles: Role[];
  emailVerified: boolean;
  unitSystem: UnitSystem;
  memberSince: string; // ISO date
  /** Whether the member gets the daily e-mail of unread notices. */
  notificationDigest: boolean;
}

/** POST /api/auth/signup answers 201 with the address only: it never says whether the address already had an account. */
export interface SignupResultDto {
  email: string;
}

/** GET /api/auth/me: the signed-in user (or null) and the CSRF token to send as `X-CSRF-Token`. */
export interface SessionDto {
  user: UserDto | null;
  csrfToken: string;
}
