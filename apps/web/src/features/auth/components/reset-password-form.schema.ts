import { passwordSchema, z } from '../../../lib/schemas';

/** A new password typed twice (loaded lazily with zod). */
export const newPasswordFormSchema = z
  .object({ password: passwordSchema, confirmPassword: z.string() })
  .refine((values) => values.password === values.confirmPassword, {
    path: ['confirmPassword'],
    message: "The two passwords don't match",
  });
